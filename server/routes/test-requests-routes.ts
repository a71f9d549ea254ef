import { Router } from 'express';
import { z } from 'zod';
import { idParamsSchema } from '#shared/schemas/list-query.ts';
import { tokenBodySchema } from '#shared/schemas/subscriptions.ts';
import { createTestRequestBodySchema, labTestRequestQuerySchema, mergeBodySchema, triageBodySchema, voteBodySchema } from '#shared/schemas/test-requests.ts';
import { requireCapability } from '../http/require-capability.ts';
import { parseWith } from '../http/validate.ts';
import type { Services } from '../services/index.ts';

const requestParams = z.object({ id: z.string().min(1).max(64) });

/** Readers' test requests and votes (/api/public/…) and the editors' triage (/api/lab/test-requests). */
export function testRequestsRoutes(s: Pick<Services, 'testRequests'>): Router {
  const router = Router();
  const triage = requireCapability('requests.triage');

  router.get('/public/test-requests', async (_req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json({ requests: await s.testRequests.listPublic() });
  });
  router.get('/public/test-requests/:id', async (req, res) => {
    const { id } = parseWith(requestParams, req.params, 'params');
    res.setHeader('Cache-Control', 'no-store');
    res.json({ request: await s.testRequests.getPublic(id) });
  });
  router.post('/public/test-requests', async (req, res) => {
    await s.testRequests.create(req.caller, parseWith(createTestRequestBodySchema, req.body));
    res.status(202).json({ status: 'check_your_email' });
  });
  router.post('/public/test-requests/:id/votes', async (req, res) => {
    const { id } = parseWith(requestParams, req.params, 'params');
    await s.testRequests.vote(req.caller, id, parseWith(voteBodySchema, req.body));
    res.status(202).json({ status: 'check_your_email' });
  });
  router.post('/public/votes/confirm', async (req, res) => {
    const { requestId } = await s.testRequests.confirmVote(req.caller, parseWith(tokenBodySchema, req.body).token);
    res.setHeader('Cache-Control', 'no-store');
    res.json({ status: 'confirmed', requestId });
  });

  router.get('/lab/test-requests', triage, async (req, res) => {
    const { status } = parseWith(labTestRequestQuerySchema, req.query, 'query');
    res.json({ requests: await s.testRequests.listLab(req.caller, status) });
  });
  router.patch('/lab/test-requests/:id', triage, async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    res.json({ request: await s.testRequests.triage(req.caller, id, parseWith(triageBodySchema, req.body)) });
  });
  router.post('/lab/test-requests/:id/merge', triage, async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    res.json({ request: await s.testRequests.merge(req.caller, id, parseWith(mergeBodySchema, req.body).intoId) });
  });
  return router;
}
