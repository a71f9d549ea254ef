import type { RequestHandler } from 'express';
import { can, type Capability } from '../../shared/auth/capabilities.ts';
import { forbidden, unauthenticated } from './app-error.ts';
import './express-augment.ts';

/** 401 without a session, 403 when the caller's role lacks the capability. */
export function requireCapability(capability: Capability): RequestHandler {
  return (req, _res, next) => {
    const user = req.caller?.user;
    if (!user) return next(unauthenticated());
    if (!can(user.role, capability)) return next(forbidden());
    next();
  };
}
