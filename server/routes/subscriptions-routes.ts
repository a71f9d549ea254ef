import express, { Router, type Response } from 'express';
import { subscribeBodySchema, tokenBodySchema, tokenQuerySchema, updatePreferencesBodySchema } from '#shared/schemas/subscriptions.ts';
import { validationFailed } from '../core/app-error.ts';
import { parseWith } from '../http/validate.ts';
import type { Services } from '../services/index.ts';

/** Answers that carry a reader's data or follow a secret link are never cached. */
const noStore = (res: Response) => res.setHeader('Cache-Control', 'no-store');

/** /api/public/subscriptions…: subscribe, confirm (POST only), preferences, unsubscribe. */
export function subscriptionsRoutes(s: Pick<Services, 'subscriptions'>): Router {
  const router = Router();

  router.post('/public/subscriptions', async (req, res) => {
    await s.subscriptions.subscribe(req.caller, parseWith(subscribeBodySchema, req.body));
    noStore(res);
    res.status(202).json({ status: 'check_your_email' });
  });
  router.post('/public/subscriptions/confirm', async (req, res) => {
    await s.subscriptions.confirm(req.caller, parseWith(tokenBodySchema, req.body).token);
    noStore(res);
    res.json({ status: 'confirmed' });
  });
  // POST, so the token stays out of URLs in logs and a prefetch reads nothing.
  router.post('/public/subscriptions/preferences', async (req, res) => {
    noStore(res);
    res.json({ preferences: await s.subscriptions.preferences(req.caller, parseWith(tokenBodySchema, req.body).token) });
  });
  router.patch('/public/subscriptions/preferences', async (req, res) => {
    noStore(res);
    res.json({ preferences: await s.subscriptions.updatePreferences(req.caller, parseWith(updatePreferencesBodySchema, req.body)) });
  });
  router.post('/public/subscriptions/unsubscribe', async (req, res) => {
    await s.subscriptions.unsubscribe(req.caller, parseWith(tokenBodySchema, req.body).token);
    noStore(res);
    res.json({ status: 'unsubscribed' });
  });
  return router;
}

/**
 * RFC 8058 one-click unsubscribe: mail clients POST `List-Unsubscribe=One-Click` (form-encoded or
 * multipart) to the URL of the List-Unsubscribe header, from their own servers, without a
 * session or an Origin header. The token in the URL is the authority, so this router is mounted
 * before the Origin check — the only one that is. A GET (a person who opened the URL) is sent to
 * the unsubscribe page, which asks before acting: a GET never unsubscribes.
 */
export function oneClickUnsubscribeRoutes(s: Pick<Services, 'subscriptions'>): Router {
  const router = Router();
  const form = [express.urlencoded({ extended: false, limit: '4kb' }), express.text({ type: 'multipart/form-data', limit: '4kb' })];

  router.post('/public/unsubscribe', ...form, async (req, res) => {
    const { token } = parseWith(tokenQuerySchema, req.query, 'query');
    const body: unknown = req.body;
    const oneClick =
      (typeof body === 'object' && body !== null && (body as Record<string, unknown>)['List-Unsubscribe'] === 'One-Click') ||
      (typeof body === 'string' && /name="List-Unsubscribe"\r?\n\r?\nOne-Click/.test(body));
    if (!oneClick) throw validationFailed([{ path: 'body.List-Unsubscribe', message: 'Send List-Unsubscribe=One-Click (RFC 8058).' }]);
    await s.subscriptions.unsubscribe(req.caller, token);
    noStore(res);
    res.json({ status: 'unsubscribed' });
  });
  router.get('/public/unsubscribe', (req, res) => {
    const { token } = parseWith(tokenQuerySchema, req.query, 'query');
    noStore(res);
    res.redirect(303, `/subscribe/unsubscribe?token=${encodeURIComponent(token)}`);
  });
  return router;
}
