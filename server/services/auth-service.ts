import { AppError } from '../core/app-error.ts';
import { usersRepo } from '../db/repos/users-repo.ts';
import { decoyHash, verifyPassword } from '../auth/password.ts';
import type { SessionUser, SignInBody } from '#shared/schemas/users.ts';
import { audit } from './audit.ts';
import type { ServiceDeps } from '../core/context.ts';
import { callerUser, userCaller, type Caller } from '../core/caller.ts';

// One text for every failure, so it does not tell whether an e-mail has an account.
const GENERIC_FAILURE = 'E-mail or password is not right.';

export function createAuthService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'sessions' | 'signInLimiter' | 'logger'>) {
  return {
    async signIn(caller: Caller, body: SignInBody, secure: boolean): Promise<{ user: SessionUser; cookie: string }> {
      const ip = caller.ip ?? 'unknown';
      const retryAfter = await deps.signInLimiter.retryAfterSeconds(ip, body.email);
      if (retryAfter > 0) {
        throw new AppError(
          'rate_limited',
          `Too many failed sign-ins. Try again in ${Math.ceil(retryAfter / 60)} minute(s).`,
          { retryAfterSeconds: retryAfter },
          { 'Retry-After': String(retryAfter) },
        );
      }
      const found = await usersRepo.findCredentialsByEmail(deps.db, body.email);
      // Verify against a decoy when the account is unknown so the answer takes as long.
      const ok = await verifyPassword(found?.passwordHash ?? (await decoyHash()), body.password);
      if (!found || !ok || !found.active) {
        await deps.signInLimiter.recordFailure(ip, body.email);
        deps.logger.info({ email: body.email, ip, requestId: caller.requestId }, 'sign-in failed');
        throw new AppError('invalid_credentials', GENERIC_FAILURE);
      }
      await deps.signInLimiter.recordSuccess(body.email);
      const { cookie } = await deps.sessions.createSession(found.id, secure);
      const user: SessionUser = { id: found.id, email: found.email, displayName: found.displayName, role: found.role };
      await audit({
        trx: deps.db,
        clock: deps.clock,
        caller: userCaller(user, { ip: caller.ip, requestId: caller.requestId }),
        action: 'user.sign_in',
        entity: { type: 'user', id: found.id },
      });
      return { user, cookie };
    },

    async signOut(caller: Caller, sessionId: string | null, secure: boolean): Promise<string> {
      if (sessionId) {
        await deps.sessions.invalidateSession(sessionId);
        const user = callerUser(caller);
        if (user) await audit({ trx: deps.db, clock: deps.clock, caller, action: 'user.sign_out', entity: { type: 'user', id: user.id } });
      }
      return deps.sessions.blankCookie(secure);
    },
  };
}
export type AuthService = ReturnType<typeof createAuthService>;
