import { Router } from 'express';
import { signInBodySchema, type MeResponse } from '#shared/schemas/users.ts';
import { parseWith } from '../http/validate.ts';
import type { AuthService } from '../services/auth-service.ts';
import '../http/express-augment.ts';

export function authRoutes(auth: AuthService): Router {
  const router = Router();

  router.get('/me', (req, res) => {
    const body: MeResponse = { user: req.caller.kind === 'user' ? req.caller.user : null };
    res.setHeader('Cache-Control', 'no-store');
    res.json(body);
  });

  router.post('/auth/sign-in', async (req, res) => {
    const body = parseWith(signInBodySchema, req.body);
    const { user, cookie } = await auth.signIn(req.caller, body, req.secure);
    res.append('Set-Cookie', cookie);
    res.json({ user });
  });

  router.post('/auth/sign-out', async (req, res) => {
    const cookie = await auth.signOut(req.caller, req.sessionId, req.secure);
    res.append('Set-Cookie', cookie);
    res.status(204).end();
  });

  return router;
}
