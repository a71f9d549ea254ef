import { Router } from 'express';
import { idParamsSchema } from '#shared/schemas/list-query.ts';
import {
  commentBodySchema,
  excludeBodySchema,
  readingParamsSchema,
  requestChangesBodySchema,
  runBodySchema,
  runListQuerySchema,
  runPatchSchema,
  transitionNoteSchema,
} from '#shared/schemas/runs.ts';
import { z } from 'zod';
import { requireCapability } from '../http/require-capability.ts';
import { uploadFiles } from '../http/upload-files.ts';
import { parseWith } from '../http/validate.ts';
import type { Services } from '../services/index.ts';

const fileParamsSchema = z.object({ id: z.string().min(1).max(64), fileId: z.string().min(1).max(64) });

/** /api/lab/runs/…: runs, their files and readings, the review workflow, comments, audit. */
export function runsRoutes(s: Pick<Services, 'runs' | 'readings' | 'runUploads' | 'runProcessing'>): Router {
  const router = Router();
  const read = requireCapability('lab.enter');
  const id = (params: unknown) => parseWith(idParamsSchema, params, 'params').id;

  router.get('/lab/runs', read, async (req, res) => {
    res.json(await s.runs.list(req.caller, parseWith(runListQuerySchema, req.query, 'query')));
  });
  router.post('/lab/runs', requireCapability('runs.create'), async (req, res) => {
    res.status(201).json({ run: await s.runs.create(req.caller, parseWith(runBodySchema, req.body)) });
  });
  router.get('/lab/review', requireCapability('runs.review'), async (req, res) => {
    const q = parseWith(runListQuerySchema, { ...req.query, sort: req.query.sort ?? 'createdAt', dir: req.query.dir ?? 'asc' }, 'query');
    res.json(await s.runs.list(req.caller, q, { statuses: ['submitted'] }));
  });
  router.get('/lab/runs/:id', read, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json({ run: await s.runs.get(req.caller, id(req.params)) });
  });
  router.patch('/lab/runs/:id', requireCapability('runs.upload'), async (req, res) => {
    res.json({ run: await s.runs.update(req.caller, id(req.params), parseWith(runPatchSchema, req.body)) });
  });

  router.post('/lab/runs/:id/files', requireCapability('runs.upload'), uploadFiles(), async (req, res) => {
    const parts = (req.files as Record<string, Express.Multer.File[]> | undefined) ?? {};
    const toUpload = (f: Express.Multer.File) => ({
      // Browsers send names as UTF-8; busboy reads them as Latin-1.
      originalName: Buffer.from(f.originalname, 'latin1').toString('utf8'),
      bytes: new Uint8Array(f.buffer.buffer, f.buffer.byteOffset, f.buffer.byteLength),
    });
    const manifest = parts.manifest?.[0] ? toUpload(parts.manifest[0]) : null;
    const result = await s.runUploads.upload(req.caller, id(req.params), (parts.files ?? []).map(toUpload), manifest);
    res.status(202).json(result);
  });
  router.get('/lab/runs/:id/files/:fileId', read, async (req, res) => {
    const p = parseWith(fileParamsSchema, req.params, 'params');
    const file = await s.readings.rawFile(req.caller, p.id, p.fileId);
    res.setHeader('Content-Type', 'application/octet-stream');
    res.setHeader('Content-Disposition', `attachment; filename*=UTF-8''${encodeURIComponent(file.name)}`);
    res.send(Buffer.from(file.bytes));
  });

  router.get('/lab/runs/:id/readings', read, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json({ readings: await s.readings.list(req.caller, id(req.params)) });
  });
  router.get('/lab/runs/:id/readings/:readingId/spectrum', read, async (req, res) => {
    const p = parseWith(readingParamsSchema, req.params, 'params');
    res.json(await s.readings.spectrum(req.caller, p.id, p.readingId));
  });
  router.post('/lab/runs/:id/readings/:readingId/exclude', requireCapability('runs.upload'), async (req, res) => {
    const p = parseWith(readingParamsSchema, req.params, 'params');
    const { reason } = parseWith(excludeBodySchema, req.body);
    await s.readings.setExcluded(req.caller, p.id, p.readingId, reason);
    res.status(204).end();
  });
  router.post('/lab/runs/:id/readings/:readingId/include', requireCapability('runs.upload'), async (req, res) => {
    const p = parseWith(readingParamsSchema, req.params, 'params');
    await s.readings.setExcluded(req.caller, p.id, p.readingId, null);
    res.status(204).end();
  });

  router.get('/lab/runs/:id/analysis', read, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await s.runProcessing.analysis(req.caller, id(req.params)));
  });

  router.post('/lab/runs/:id/submit', requireCapability('runs.upload'), async (req, res) => {
    const { note } = parseWith(transitionNoteSchema, req.body ?? {});
    res.json({ run: await s.runs.transition(req.caller, id(req.params), 'submit', note) });
  });
  router.post('/lab/runs/:id/request-changes', requireCapability('runs.review'), async (req, res) => {
    const { note } = parseWith(requestChangesBodySchema, req.body);
    res.json({ run: await s.runs.transition(req.caller, id(req.params), 'request_changes', note) });
  });
  router.post('/lab/runs/:id/approve', requireCapability('runs.review'), async (req, res) => {
    const { note } = parseWith(transitionNoteSchema, req.body ?? {});
    res.json({ run: await s.runs.transition(req.caller, id(req.params), 'approve', note) });
  });

  router.get('/lab/runs/:id/audit', read, async (req, res) => {
    res.json({ events: await s.runs.auditTrail(req.caller, id(req.params)) });
  });
  router.get('/lab/runs/:id/comments', read, async (req, res) => {
    res.json({ comments: await s.runs.comments(req.caller, id(req.params)) });
  });
  router.post('/lab/runs/:id/comments', requireCapability('runs.upload'), async (req, res) => {
    res.status(201).json({ comments: await s.runs.addComment(req.caller, id(req.params), parseWith(commentBodySchema, req.body)) });
  });

  return router;
}
