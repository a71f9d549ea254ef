import express, { Router } from 'express';
import type { PaymentWebhookResponse } from '#shared/schemas/payments.ts';
import type { Services } from '../services/index.ts';

/**
 * POST /api/payments/webhook: events from the payment provider. Mounted before the JSON body
 * parser, the session and the Origin check (the provider is no browser): the signature covers
 * the exact bytes, so the body is read raw and parsed only after it is verified.
 */
export function paymentsWebhookRoutes(services: Pick<Services, 'paymentEvents'>): Router {
  const router = Router();
  router.post('/api/payments/webhook', express.raw({ type: 'application/json', limit: '1mb' }), async (req, res) => {
    const raw = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
    const result = await services.paymentEvents.receive(raw, req.get('stripe-signature'));
    const body: PaymentWebhookResponse = { received: true, duplicate: result.duplicate };
    res.setHeader('Cache-Control', 'no-store');
    res.json(body);
  });
  return router;
}
