import type { RequestHandler } from 'express';
import { can, type Capability } from '#shared/auth/capabilities.ts';
import { forbidden, unauthenticated } from '../core/app-error.ts';
import './express-augment.ts';

/**
 * Early refusal at the route: 401 without a session, 403 when the role lacks the capability.
 * The service checks again (assertCan); this only saves work and keeps answers uniform.
 */
export function requireCapability(capability: Capability): RequestHandler {
  return (req, _res, next) => {
    const user = req.caller?.kind === 'user' ? req.caller.user : null;
    if (!user) return next(unauthenticated());
    if (!can(user.role, capability)) return next(forbidden());
    next();
  };
}
