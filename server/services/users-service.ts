import { randomUUID } from 'node:crypto';
import { AppError, notFound } from '../core/app-error.ts';
import { callerUser, type Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { usersRepo } from '../db/repos/users-repo.ts';
import { hashPassword } from '../auth/password.ts';
import type { CreateUserBody, UpdateUserBody, User } from '#shared/schemas/users.ts';
import { audit } from './audit.ts';
import { assertCan } from './permissions.ts';

const summary = (u: User) => ({ email: u.email, displayName: u.displayName, role: u.role, active: u.active });

/** Staff accounts: the only writer of the users table, whoever calls (admin page, CLI, seed, tests). */
export function createUsersService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'sessions'>) {
  return {
    async list(caller: Caller): Promise<User[]> {
      assertCan(caller, 'users.manage');
      return usersRepo.list(deps.db);
    },

    /** The account's id for an e-mail (any case), or null. */
    async findIdByEmail(caller: Caller, email: string): Promise<string | null> {
      assertCan(caller, 'users.manage');
      return usersRepo.findIdByEmail(deps.db, email);
    },

    async create(caller: Caller, body: CreateUserBody): Promise<User> {
      assertCan(caller, 'users.manage');
      const passwordHash = await hashPassword(body.password);
      return deps.db.transaction(async (trx) => {
        if (await usersRepo.emailExists(trx, body.email)) {
          throw new AppError('email_taken', 'An account with this e-mail already exists.', [
            { path: 'body.email', message: 'An account with this e-mail already exists.' },
          ]);
        }
        const user = await usersRepo.insert(trx, { id: randomUUID(), ...body, passwordHash, now: deps.clock.now() });
        await audit({ trx, clock: deps.clock, caller, action: 'user.create', entity: { type: 'user', id: user.id }, after: summary(user) });
        return user;
      });
    },

    async update(caller: Caller, id: string, body: UpdateUserBody): Promise<User> {
      assertCan(caller, 'users.manage');
      const me = callerUser(caller);
      const updated = await deps.db.transaction(async (trx) => {
        // Lock the active admins first, so two requests cannot remove the last two at once.
        await usersRepo.lockActiveAdmins(trx);
        const before = await usersRepo.findById(trx, id);
        if (!before) throw notFound('That user');
        if (me && id === me.id && (body.active === false || (body.role && body.role !== 'admin'))) {
          throw new AppError('conflict', 'You cannot deactivate yourself or remove your own admin role.');
        }
        const losesAdmin = before.role === 'admin' && before.active && (body.active === false || (body.role && body.role !== 'admin'));
        if (losesAdmin && (await usersRepo.countActiveAdmins(trx)) <= 1) {
          throw new AppError('conflict', 'The lab needs at least one active admin.');
        }
        const after = await usersRepo.update(trx, id, body, deps.clock.now());
        if (!after) throw notFound('That user');
        const action = body.active === false ? 'user.deactivate' : body.active === true && !before.active ? 'user.reactivate' : 'user.update';
        await audit({ trx, clock: deps.clock, caller, action, entity: { type: 'user', id }, before: summary(before), after: summary(after) });
        return after;
      });
      // A deactivated user's sessions end at once; a role change takes effect on the next request anyway.
      if (!updated.active) await deps.sessions.invalidateUserSessions(id);
      return updated;
    },

    /** Sets a new password and ends every session of that account. */
    async setPassword(caller: Caller, id: string, password: string): Promise<void> {
      assertCan(caller, 'users.manage');
      const passwordHash = await hashPassword(password);
      await deps.db.transaction(async (trx) => {
        const user = await usersRepo.findById(trx, id);
        if (!user) throw notFound('That user');
        await usersRepo.setPassword(trx, id, passwordHash, deps.clock.now());
        await audit({ trx, clock: deps.clock, caller, action: 'user.password_set', entity: { type: 'user', id } });
      });
      await deps.sessions.invalidateUserSessions(id);
    },
  };
}
export type UsersService = ReturnType<typeof createUsersService>;
