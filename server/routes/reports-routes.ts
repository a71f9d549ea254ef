import { Router } from 'express';
import { idParamsSchema } from '#shared/schemas/list-query.ts';
import { correctionBodySchema, reportBodySchema, reportDraftPatchSchema, retractBodySchema } from '#shared/schemas/reports.ts';
import { requireCapability } from '../http/require-capability.ts';
import { parseWith } from '../http/validate.ts';
import type { Services } from '../services/index.ts';

/** /api/lab/reports: drafts over approved runs, preview, publication, corrections, retraction. */
export function reportsRoutes(s: Pick<Services, 'reports'>): Router {
  const router = Router();
  const read = requireCapability('lab.enter');
  const publish = requireCapability('reports.publish');
  const id = (params: unknown) => parseWith(idParamsSchema, params, 'params').id;

  router.get('/lab/reports', read, async (req, res) => {
    res.json({ reports: await s.reports.list(req.caller) });
  });
  router.post('/lab/reports', publish, async (req, res) => {
    res.status(201).json({ report: await s.reports.create(req.caller, parseWith(reportBodySchema, req.body)) });
  });
  router.get('/lab/reports/:id', read, async (req, res) => {
    res.json({ report: await s.reports.get(req.caller, id(req.params)) });
  });
  router.patch('/lab/reports/:id', publish, async (req, res) => {
    res.json({ report: await s.reports.updateDraft(req.caller, id(req.params), parseWith(reportDraftPatchSchema, req.body)) });
  });
  router.get('/lab/reports/:id/preview', publish, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json({ report: await s.reports.preview(req.caller, id(req.params)) });
  });
  router.post('/lab/reports/:id/publish', publish, async (req, res) => {
    res.json({ report: await s.reports.publish(req.caller, id(req.params)) });
  });
  router.post('/lab/reports/:id/corrections', publish, async (req, res) => {
    res.json({ report: await s.reports.correct(req.caller, id(req.params), parseWith(correctionBodySchema, req.body)) });
  });
  router.post('/lab/reports/:id/retract', publish, async (req, res) => {
    const { reason } = parseWith(retractBodySchema, req.body);
    res.json({ report: await s.reports.retract(req.caller, id(req.params), reason) });
  });
  return router;
}
