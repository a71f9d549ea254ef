import { Router } from 'express';
import type { ZodType } from 'zod';
import { deviceUnitBodySchema, deviceUnitListQuerySchema, deviceUnitPatchSchema } from '#shared/schemas/device-units.ts';
import { instrumentBodySchema, instrumentListQuerySchema, instrumentPatchSchema } from '#shared/schemas/instruments.ts';
import { idParamsSchema } from '#shared/schemas/list-query.ts';
import { makerBodySchema, makerListQuerySchema, makerPatchSchema } from '#shared/schemas/makers.ts';
import { modelBodySchema, modelListQuerySchema, modelPatchSchema } from '#shared/schemas/models.ts';
import { requireCapability } from '../http/require-capability.ts';
import { parseWith } from '../http/validate.ts';
import type { Caller } from '../core/caller.ts';
import type { Services } from '../services/index.ts';

/** What each catalogue service offers: list, create, read and update, all as a caller. */
interface CatalogService<Q, B, P> {
  list(caller: Caller, query: Q): Promise<unknown>;
  create(caller: Caller, body: B): Promise<unknown>;
  get(caller: Caller, id: string): Promise<unknown>;
  update(caller: Caller, id: string, patch: P): Promise<unknown>;
}

/** The four routes of one catalogue resource; `key` names the record in the answers. */
function catalogResource<Q, B, P>(
  router: Router,
  path: string,
  key: string,
  service: CatalogService<Q, B, P>,
  schemas: { list: ZodType<Q>; body: ZodType<B>; patch: ZodType<P> },
): void {
  const read = requireCapability('lab.enter');
  const write = requireCapability('catalog.manage');
  router.get(path, read, async (req, res) => {
    res.json(await service.list(req.caller, parseWith(schemas.list, req.query, 'query')));
  });
  router.post(path, write, async (req, res) => {
    res.status(201).json({ [key]: await service.create(req.caller, parseWith(schemas.body, req.body)) });
  });
  router.get(`${path}/:id`, read, async (req, res) => {
    res.json({ [key]: await service.get(req.caller, parseWith(idParamsSchema, req.params, 'params').id) });
  });
  router.patch(`${path}/:id`, write, async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    res.json({ [key]: await service.update(req.caller, id, parseWith(schemas.patch, req.body)) });
  });
}

/**
 * /api/lab/makers, /models, /units, /instruments: the catalogue. Every member of staff reads it;
 * catalog.manage writes. Lists take sort, dir, q, page, pageSize and their own filters.
 */
export function catalogRoutes(s: Pick<Services, 'makers' | 'models' | 'deviceUnits' | 'instruments'>): Router {
  const router = Router();
  catalogResource(router, '/lab/makers', 'maker', s.makers, { list: makerListQuerySchema, body: makerBodySchema, patch: makerPatchSchema });
  catalogResource(router, '/lab/models', 'model', s.models, { list: modelListQuerySchema, body: modelBodySchema, patch: modelPatchSchema });
  catalogResource(router, '/lab/units', 'unit', s.deviceUnits, { list: deviceUnitListQuerySchema, body: deviceUnitBodySchema, patch: deviceUnitPatchSchema });
  catalogResource(router, '/lab/instruments', 'instrument', s.instruments, {
    list: instrumentListQuerySchema,
    body: instrumentBodySchema,
    patch: instrumentPatchSchema,
  });
  return router;
}
