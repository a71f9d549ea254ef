import { Router } from 'express';
import { z } from 'zod';
import { pledgeBodySchema, setGoalBodySchema, type PledgeCreated } from '#shared/schemas/funding.ts';
import { idParamsSchema } from '#shared/schemas/list-query.ts';
import { publicBaseUrl } from '../http/public-url.ts';
import { requireCapability } from '../http/require-capability.ts';
import { parseWith } from '../http/validate.ts';
import type { Services } from '../services/index.ts';

const uuidParams = z.object({ id: z.string().uuid() });

/** Readers' pledges (/api/public/…) and the editors' goals (/api/lab/test-requests/:id/goal). */
export function pledgesRoutes(s: Pick<Services, 'pledges'>, opts: { publicBaseUrl?: string }): Router {
  const router = Router();

  router.get('/public/funding', (_req, res) => {
    res.setHeader('Cache-Control', 'public, max-age=300');
    res.json(s.pledges.settings());
  });
  router.post('/public/test-requests/:id/pledges', async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    const created: PledgeCreated = await s.pledges.create(req.caller, id, parseWith(pledgeBodySchema, req.body), publicBaseUrl(req, opts.publicBaseUrl));
    res.setHeader('Cache-Control', 'no-store');
    res.status(201).json(created);
  });
  router.get('/public/pledges/:id', async (req, res) => {
    const { id } = parseWith(uuidParams, req.params, 'params');
    res.setHeader('Cache-Control', 'no-store');
    res.json({ pledge: await s.pledges.getPublic(id) });
  });

  router.put('/lab/test-requests/:id/goal', requireCapability('requests.triage'), async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    res.json({ request: await s.pledges.setGoal(req.caller, id, parseWith(setGoalBodySchema, req.body)) });
  });
  return router;
}
