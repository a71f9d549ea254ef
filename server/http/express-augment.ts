import type { Caller } from '../core/caller.ts';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** Set by the session middleware for every request. */
      caller: Caller;
      /** The session id from the cookie, when it was valid. */
      sessionId: string | null;
    }
  }
}
export {};
