/**
 * Sign-in sessions. The only module that knows lucia (v3 is no longer maintained upstream,
 * so it stays replaceable): the rest of the server sees SessionAuth.
 */
import { Lucia, TimeSpan } from 'lucia';
import { NodePostgresAdapter } from '@lucia-auth/adapter-postgresql';
import type pg from 'pg';
import type { Role } from '#shared/auth/capabilities.ts';
import type { SessionUser } from '#shared/schemas/users.ts';

interface UserRow {
  email: string;
  display_name: string;
  role: Role;
  active: boolean;
}

declare module 'lucia' {
  interface Register {
    DatabaseUserAttributes: UserRow;
  }
}

export interface ValidatedSession {
  sessionId: string;
  user: SessionUser & { active: boolean };
  /** A Set-Cookie value when the session was extended, else null. */
  refreshedCookie: string | null;
}

export interface SessionAuth {
  /** The session id in a Cookie header, or null. */
  readSessionId(cookieHeader: string | undefined): string | null;
  createSession(userId: string, secure: boolean): Promise<{ sessionId: string; cookie: string }>;
  validate(sessionId: string, secure: boolean): Promise<ValidatedSession | null>;
  invalidateSession(sessionId: string): Promise<void>;
  invalidateUserSessions(userId: string): Promise<void>;
  blankCookie(secure: boolean): string;
}

export function createSessionAuth(pool: pg.Pool): SessionAuth {
  const adapter = new NodePostgresAdapter(pool, { user: 'users', session: 'user_sessions' });
  const lucia = new Lucia(adapter, {
    sessionExpiresIn: new TimeSpan(12, 'h'),
    sessionCookie: { name: 'benchlight_session', attributes: { sameSite: 'lax' } },
    // The adapter selects every column: expose only these (never password_hash).
    getUserAttributes: (row) => ({
      email: row.email,
      display_name: row.display_name,
      role: row.role,
      active: row.active,
    }),
  });

  // Secure is decided per request: on when the page was served over https.
  const serialize = (cookie: ReturnType<typeof lucia.createBlankSessionCookie>, secure: boolean) => {
    cookie.attributes.secure = secure;
    cookie.attributes.httpOnly = true;
    cookie.attributes.sameSite = 'lax';
    return cookie.serialize();
  };

  return {
    readSessionId: (cookieHeader) => (cookieHeader ? lucia.readSessionCookie(cookieHeader) : null),
    async createSession(userId, secure) {
      const session = await lucia.createSession(userId, {});
      return { sessionId: session.id, cookie: serialize(lucia.createSessionCookie(session.id), secure) };
    },
    async validate(sessionId, secure) {
      const { session, user } = await lucia.validateSession(sessionId);
      if (!session || !user) return null;
      const attrs = user as unknown as UserRow & { id: string };
      return {
        sessionId: session.id,
        user: {
          id: user.id,
          email: attrs.email,
          displayName: attrs.display_name,
          role: attrs.role,
          active: attrs.active,
        },
        refreshedCookie: session.fresh ? serialize(lucia.createSessionCookie(session.id), secure) : null,
      };
    },
    invalidateSession: (sessionId) => lucia.invalidateSession(sessionId),
    invalidateUserSessions: (userId) => lucia.invalidateUserSessions(userId),
    blankCookie: (secure) => serialize(lucia.createBlankSessionCookie(), secure),
  };
}
