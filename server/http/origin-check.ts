import type { RequestHandler } from 'express';
import { verifyRequestOrigin } from 'lucia';
import { AppError } from '../core/app-error.ts';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * CSRF defence: every state-changing request must carry an Origin naming this host
 * (or one of ALLOWED_ORIGINS). Browsers always send Origin on such requests.
 */
export function originCheck(extraOrigins: string[]): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get('origin');
    const host = req.get('x-forwarded-host') && req.app.get('trust proxy') ? req.get('x-forwarded-host') : req.get('host');
    const allowed = [host, ...extraOrigins].filter((h): h is string => Boolean(h));
    if (!origin || !verifyRequestOrigin(origin, allowed)) {
      return next(new AppError('origin_rejected', 'This request did not come from a Benchlight page.'));
    }
    next();
  };
}
