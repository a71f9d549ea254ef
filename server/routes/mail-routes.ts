import { Router } from 'express';
import { idParamsSchema } from '#shared/schemas/list-query.ts';
import { mailboxIdParamsSchema, outboxQuerySchema } from '#shared/schemas/mail.ts';
import { requireCapability } from '../http/require-capability.ts';
import { parseWith } from '../http/validate.ts';
import type { Services } from '../services/index.ts';

/** The send log and, while the local fake SMTP server is in use, its mailbox (admins); the lab's settings. */
export function mailRoutes(s: Pick<Services, 'outbox' | 'mailbox'>): Router {
  const router = Router();
  const manage = requireCapability('mail.manage');

  router.get('/lab/settings', requireCapability('lab.enter'), (req, res) => {
    res.json(s.mailbox.settings(req.caller));
  });
  router.get('/admin/mail/outbox', manage, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await s.outbox.list(req.caller, parseWith(outboxQuerySchema, req.query, 'query')));
  });
  router.post('/admin/mail/outbox/:id/resend', manage, async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    res.json({ message: await s.outbox.resend(req.caller, id) });
  });
  router.get('/admin/mailbox', manage, (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json({ messages: s.mailbox.list(req.caller) });
  });
  router.get('/admin/mailbox/:id', manage, (req, res) => {
    const { id } = parseWith(mailboxIdParamsSchema, req.params, 'params');
    res.setHeader('Cache-Control', 'no-store');
    res.json({ message: s.mailbox.get(req.caller, id) });
  });
  return router;
}
