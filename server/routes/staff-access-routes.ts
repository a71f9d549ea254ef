import { Router } from 'express';
import { idParamsSchema } from '#shared/schemas/list-query.ts';
import { acceptInvitationBodySchema, createInvitationBodySchema, passwordResetBodySchema, passwordResetRequestBodySchema } from '#shared/schemas/invitations.ts';
import { tokenBodySchema } from '#shared/schemas/subscriptions.ts';
import { requireCapability } from '../http/require-capability.ts';
import { parseWith } from '../http/validate.ts';
import type { Services } from '../services/index.ts';

/** Staff invitations (admins invite; the invitee accepts from the e-mail) and password reset by e-mail. */
export function staffAccessRoutes(s: Pick<Services, 'invitations' | 'passwordResets'>): Router {
  const router = Router();
  const manage = requireCapability('users.manage');

  router.get('/admin/invitations', manage, async (req, res) => {
    res.json({ invitations: await s.invitations.list(req.caller) });
  });
  router.post('/admin/invitations', manage, async (req, res) => {
    res.status(201).json({ invitation: await s.invitations.create(req.caller, parseWith(createInvitationBodySchema, req.body)) });
  });
  router.post('/admin/invitations/:id/revoke', manage, async (req, res) => {
    const { id } = parseWith(idParamsSchema, req.params, 'params');
    res.json({ invitation: await s.invitations.revoke(req.caller, id) });
  });

  router.post('/auth/invitations/preview', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json({ invitation: await s.invitations.preview(req.caller, parseWith(tokenBodySchema, req.body).token) });
  });
  router.post('/auth/invitations/accept', async (req, res) => {
    const { email } = await s.invitations.accept(req.caller, parseWith(acceptInvitationBodySchema, req.body));
    res.setHeader('Cache-Control', 'no-store');
    res.status(201).json({ status: 'accepted', email });
  });

  router.post('/auth/password-resets', async (req, res) => {
    await s.passwordResets.request(req.caller, parseWith(passwordResetRequestBodySchema, req.body));
    res.status(202).json({ status: 'check_your_email' });
  });
  router.post('/auth/password-resets/complete', async (req, res) => {
    const { email } = await s.passwordResets.reset(req.caller, parseWith(passwordResetBodySchema, req.body));
    res.setHeader('Cache-Control', 'no-store');
    res.json({ status: 'password_set', email });
  });
  return router;
}
