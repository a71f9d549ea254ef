import type { RequestHandler } from 'express';
import type { SessionAuth } from '../auth/session-auth.ts';
import './express-augment.ts';

/** Resolves the session cookie into req.caller; clears cookies of ended sessions. */
export function sessionMiddleware(sessions: SessionAuth): RequestHandler {
  return async (req, res, next) => {
    const base = { requestId: String(req.id ?? ''), ip: req.ip ?? 'unknown' };
    req.caller = { kind: 'anonymous', ...base };
    req.sessionId = null;
    const sessionId = sessions.readSessionId(req.headers.cookie);
    if (!sessionId) return next();
    try {
      const found = await sessions.validate(sessionId, req.secure);
      if (!found || !found.user.active) {
        if (found) await sessions.invalidateSession(found.sessionId);
        res.append('Set-Cookie', sessions.blankCookie(req.secure));
        return next();
      }
      if (found.refreshedCookie) res.append('Set-Cookie', found.refreshedCookie);
      const { active: _active, ...user } = found.user;
      req.caller = { kind: 'user', user, ...base };
      req.sessionId = found.sessionId;
      next();
    } catch (err) {
      next(err);
    }
  };
}
