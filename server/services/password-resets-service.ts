/**
 * Password reset by e-mail. The same answer, after the same work, for an unknown address; the
 * link works 1 h and once; setting the password ends every session of the account.
 */
import { randomUUID } from 'node:crypto';
import { passwordResetBodySchema, passwordResetRequestBodySchema, type PasswordResetBody } from '#shared/schemas/invitations.ts';
import { hashPassword } from '../auth/password.ts';
import type { ReaderLimiter } from '../auth/reader-limiter.ts';
import { AppError } from '../core/app-error.ts';
import { userCaller, type Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { emailTokensRepo } from '../db/repos/email-tokens-repo.ts';
import { usersRepo } from '../db/repos/users-repo.ts';
import { audit } from './audit.ts';
import { useEmailToken } from './email-token-check.ts';
import type { OutboxService } from './outbox-service.ts';
import { takeReaderLimit } from './subscriptions-service.ts';

/** Thrown to roll back the stand-in work done for an unknown address. */
class Discard extends Error {}

export function createPasswordResetsService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'sessions'>, outbox: OutboxService, limiter: ReaderLimiter) {
  return {
    async request(caller: Caller, input: { email: string }): Promise<void> {
      const { email } = passwordResetRequestBodySchema.parse(input);
      if (!(await takeReaderLimit(limiter, caller, email))) return;
      try {
        await deps.db.transaction(async (trx) => {
          // The same two lookups whether or not the address has an account.
          const user = await usersRepo.findById(trx, (await usersRepo.findIdByEmail(trx, email)) ?? '');
          const known = Boolean(user?.active);
          // For an unknown (or deactivated) address the same rows are written and rolled back,
          // so the answer takes as long and tells nothing.
          await outbox.record(trx, [{ recipient: email, purpose: `password-reset:${randomUUID()}`, kind: 'password_reset', payload: { userId: user?.id ?? 'none' } }]);
          if (!known) throw new Discard();
        });
      } catch (err) {
        if (!(err instanceof Discard)) throw err;
      }
    },

    async reset(caller: Caller, input: PasswordResetBody): Promise<{ email: string }> {
      const body = passwordResetBodySchema.parse(input);
      const passwordHash = await hashPassword(body.password);
      const user = await deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        const used = await useEmailToken(trx, 'password_reset', body.token, now);
        const found = await usersRepo.findById(trx, used.subject);
        if (!found || !found.active) throw new AppError('token_used', 'This account cannot sign in any more. Ask an admin.');
        await usersRepo.setPassword(trx, found.id, passwordHash, now);
        // Any other reset link of this account stops working too.
        await emailTokensRepo.useAll(trx, 'password_reset', found.id, now);
        await audit({ trx, clock: deps.clock, caller: userCaller({ id: found.id, email: found.email, displayName: found.displayName, role: found.role }, { ip: caller.ip, requestId: caller.requestId }), action: 'user.password_reset', entity: { type: 'user', id: found.id } });
        return found;
      });
      await deps.sessions.invalidateUserSessions(user.id);
      return { email: user.email };
    },
  };
}
export type PasswordResetsService = ReturnType<typeof createPasswordResetsService>;
