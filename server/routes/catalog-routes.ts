import { Router } from 'express';
import { deviceUnitBodySchema, deviceUnitListQuerySchema, deviceUnitPatchSchema } from '#shared/schemas/device-units.ts';
import { instrumentBodySchema, instrumentListQuerySchema, instrumentPatchSchema } from '#shared/schemas/instruments.ts';
import { idParamsSchema } from '#shared/schemas/list-query.ts';
import { makerBodySchema, makerListQuerySchema, makerPatchSchema } from '#shared/schemas/makers.ts';
import { modelBodySchema, modelListQuerySchema, modelPatchSchema } from '#shared/schemas/models.ts';
import { requireCapability } from '../http/require-capability.ts';
import { parseWith } from '../http/validate.ts';
import type { Services } from '../services/index.ts';

/**
 * /api/lab/makers, /models, /units, /instruments: the catalogue. Every member of staff reads it;
 * catalog.manage writes. Lists take sort, dir, q, page, pageSize and their own filters.
 */
export function catalogRoutes(s: Pick<Services, 'makers' | 'models' | 'deviceUnits' | 'instruments'>): Router {
  const router = Router();
  const read = requireCapability('lab.enter');
  const write = requireCapability('catalog.manage');

  router.get('/lab/makers', read, async (req, res) => {
    res.json(await s.makers.list(req.caller, parseWith(makerListQuerySchema, req.query, 'query')));
  });
  router.post('/lab/makers', write, async (req, res) => {
    res.status(201).json({ maker: await s.makers.create(req.caller, parseWith(makerBodySchema, req.body)) });
  });
  router.get('/lab/makers/:id', read, async (req, res) => {
    res.json({ maker: await s.makers.get(req.caller, parseWith(idParamsSchema, req.params, 'params').id) });
  });
  router.patch('/lab/makers/:id', write, async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    res.json({ maker: await s.makers.update(req.caller, id, parseWith(makerPatchSchema, req.body)) });
  });

  router.get('/lab/models', read, async (req, res) => {
    res.json(await s.models.list(req.caller, parseWith(modelListQuerySchema, req.query, 'query')));
  });
  router.post('/lab/models', write, async (req, res) => {
    res.status(201).json({ model: await s.models.create(req.caller, parseWith(modelBodySchema, req.body)) });
  });
  router.get('/lab/models/:id', read, async (req, res) => {
    res.json({ model: await s.models.get(req.caller, parseWith(idParamsSchema, req.params, 'params').id) });
  });
  router.patch('/lab/models/:id', write, async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    res.json({ model: await s.models.update(req.caller, id, parseWith(modelPatchSchema, req.body)) });
  });

  router.get('/lab/units', read, async (req, res) => {
    res.json(await s.deviceUnits.list(req.caller, parseWith(deviceUnitListQuerySchema, req.query, 'query')));
  });
  router.post('/lab/units', write, async (req, res) => {
    res.status(201).json({ unit: await s.deviceUnits.create(req.caller, parseWith(deviceUnitBodySchema, req.body)) });
  });
  router.get('/lab/units/:id', read, async (req, res) => {
    res.json({ unit: await s.deviceUnits.get(req.caller, parseWith(idParamsSchema, req.params, 'params').id) });
  });
  router.patch('/lab/units/:id', write, async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    res.json({ unit: await s.deviceUnits.update(req.caller, id, parseWith(deviceUnitPatchSchema, req.body)) });
  });

  router.get('/lab/instruments', read, async (req, res) => {
    res.json(await s.instruments.list(req.caller, parseWith(instrumentListQuerySchema, req.query, 'query')));
  });
  router.post('/lab/instruments', write, async (req, res) => {
    res.status(201).json({ instrument: await s.instruments.create(req.caller, parseWith(instrumentBodySchema, req.body)) });
  });
  router.get('/lab/instruments/:id', read, async (req, res) => {
    res.json({ instrument: await s.instruments.get(req.caller, parseWith(idParamsSchema, req.params, 'params').id) });
  });
  router.patch('/lab/instruments/:id', write, async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    res.json({ instrument: await s.instruments.update(req.caller, id, parseWith(instrumentPatchSchema, req.body)) });
  });

  return router;
}
