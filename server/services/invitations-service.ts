/**
 * Staff invitations: an admin names the address, the name and the role; the invitee chooses
 * their own password from the e-mailed link (valid 72 h, once), so no admin ever sees it.
 */
import { randomUUID } from 'node:crypto';
import type { AcceptInvitationBody, CreateInvitationBody, Invitation } from '#shared/schemas/invitations.ts';
import { acceptInvitationBodySchema, createInvitationBodySchema } from '#shared/schemas/invitations.ts';
import { TOKEN_LIFETIME_MS } from '../auth/email-tokens.ts';
import { hashPassword } from '../auth/password.ts';
import { AppError, notFound } from '../core/app-error.ts';
import { callerUser, userCaller, type Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { emailTokensRepo } from '../db/repos/email-tokens-repo.ts';
import { hashEmailToken } from '../auth/email-tokens.ts';
import { invitationsRepo } from '../db/repos/invitations-repo.ts';
import { usersRepo } from '../db/repos/users-repo.ts';
import { audit } from './audit.ts';
import { useEmailToken } from './email-token-check.ts';
import type { OutboxService } from './outbox-service.ts';
import { assertCan } from './permissions.ts';

const emailTaken = () =>
  new AppError('email_taken', 'A staff account with this e-mail already exists.', [{ path: 'body.email', message: 'A staff account with this e-mail already exists.' }]);

export function createInvitationsService(deps: Pick<ServiceDeps, 'db' | 'clock'>, outbox: OutboxService) {
  /** The pending, unexpired invitation a token belongs to (not using the token up). */
  const pendingByToken = async (token: string): Promise<Invitation> => {
    const found = await emailTokensRepo.findByHash(deps.db, 'invitation', hashEmailToken(token));
    if (!found) throw notFound('That invitation');
    if (found.usedAt) throw new AppError('token_used', 'This invitation has been used already. Sign in, or ask an admin for a new one.');
    const invitation = await invitationsRepo.find(deps.db, found.subject);
    if (!invitation || invitation.status !== 'pending') throw new AppError('token_used', 'This invitation was withdrawn or used. Ask an admin for a new one.');
    if (new Date(invitation.expiresAt) <= deps.clock.now() || (found.expiresAt && new Date(found.expiresAt) <= deps.clock.now())) {
      throw new AppError('token_expired', 'This invitation has expired. Ask an admin for a new one.');
    }
    return invitation;
  };

  return {
    async list(caller: Caller): Promise<Invitation[]> {
      assertCan(caller, 'users.manage');
      return invitationsRepo.list(deps.db);
    },

    /** A new invitation replaces a pending one for the same address. */
    async create(caller: Caller, input: CreateInvitationBody): Promise<Invitation> {
      assertCan(caller, 'users.manage');
      const body = createInvitationBodySchema.parse(input);
      const id = randomUUID();
      await deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        if (await usersRepo.emailExists(trx, body.email)) throw emailTaken();
        const replaced = await invitationsRepo.revokePendingFor(trx, body.email, now);
        for (const old of replaced) await emailTokensRepo.useAll(trx, 'invitation', old, now);
        const expiresAt = new Date(now.getTime() + (TOKEN_LIFETIME_MS.invitation ?? 0));
        await invitationsRepo.insert(trx, { id, email: body.email, displayName: body.displayName, role: body.role, invitedBy: callerUser(caller)?.id ?? null, expiresAt, now });
        await outbox.record(trx, [{ recipient: body.email, purpose: `invitation:${id}`, kind: 'invitation', payload: { invitationId: id } }]);
        await audit({ trx, clock: deps.clock, caller, action: 'invitation.create', entity: { type: 'invitation', id }, after: { email: body.email, role: body.role, replaced } });
      });
      return (await invitationsRepo.find(deps.db, id))!;
    },

    async revoke(caller: Caller, id: string): Promise<Invitation> {
      assertCan(caller, 'users.manage');
      await deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        const before = await invitationsRepo.find(trx, id, { lock: true });
        if (!before) throw notFound('That invitation');
        if (!(await invitationsRepo.setStatus(trx, id, 'revoked', now))) throw new AppError('conflict', `This invitation is ${before.status} already.`);
        await emailTokensRepo.useAll(trx, 'invitation', id, now);
        await audit({ trx, clock: deps.clock, caller, action: 'invitation.revoke', entity: { type: 'invitation', id }, before: { status: before.status }, after: { status: 'revoked' } });
      });
      return (await invitationsRepo.find(deps.db, id))!;
    },

    /** What the invitee sees before choosing a password. */
    async preview(_caller: Caller, token: string) {
      const i = await pendingByToken(token);
      return { email: i.email, displayName: i.displayName, role: i.role, expiresAt: i.expiresAt };
    },

    /** The invitee's own password; the account is made with the invited role. */
    async accept(caller: Caller, input: AcceptInvitationBody): Promise<{ email: string }> {
      const body = acceptInvitationBodySchema.parse(input);
      const passwordHash = await hashPassword(body.password);
      return deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        const used = await useEmailToken(trx, 'invitation', body.token, now);
        const invitation = await invitationsRepo.find(trx, used.subject, { lock: true });
        if (!invitation || invitation.status !== 'pending') throw new AppError('token_used', 'This invitation was withdrawn or used. Ask an admin for a new one.');
        if (new Date(invitation.expiresAt) <= now) throw new AppError('token_expired', 'This invitation has expired. Ask an admin for a new one.');
        if (await usersRepo.emailExists(trx, invitation.email)) throw emailTaken();
        const user = await usersRepo.insert(trx, { id: randomUUID(), email: invitation.email, displayName: body.displayName ?? invitation.displayName, role: invitation.role, passwordHash, now });
        await invitationsRepo.setStatus(trx, invitation.id, 'accepted', now, user.id);
        const actor = userCaller({ id: user.id, email: user.email, displayName: user.displayName, role: user.role }, { ip: caller.ip, requestId: caller.requestId });
        await audit({ trx, clock: deps.clock, caller: actor, action: 'user.create', entity: { type: 'user', id: user.id }, after: { email: user.email, displayName: user.displayName, role: user.role, active: true, invitation: invitation.id } });
        await audit({ trx, clock: deps.clock, caller: actor, action: 'invitation.accept', entity: { type: 'invitation', id: invitation.id }, before: { status: 'pending' }, after: { status: 'accepted', userId: user.id } });
        return { email: user.email };
      });
    },
  };
}
export type InvitationsService = ReturnType<typeof createInvitationsService>;
