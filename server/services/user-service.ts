import { randomUUID } from 'node:crypto';
import { AppError, forbidden, notFound } from '../http/app-error.ts';
import { usersRepo } from '../db/repos/users-repo.ts';
import { hashPassword } from '../auth/password.ts';
import { can } from '../../shared/auth/capabilities.ts';
import type { CreateUserBody, UpdateUserBody, User } from '../../shared/schemas/users.ts';
import { audit } from './audit.ts';
import type { Caller, ServiceDeps } from './context.ts';

function requireManager(caller: Caller) {
  if (!caller.user) throw new AppError('unauthenticated', 'Sign in first.');
  if (!can(caller.user.role, 'users.manage')) throw forbidden('Your role cannot manage users.');
  return caller.user;
}

const summary = (u: User) => ({ email: u.email, displayName: u.displayName, role: u.role, active: u.active });

export function createUserService(deps: ServiceDeps) {
  return {
    async list(caller: Caller): Promise<User[]> {
      requireManager(caller);
      return usersRepo.list(deps.db);
    },

    async create(caller: Caller, body: CreateUserBody): Promise<User> {
      requireManager(caller);
      const passwordHash = await hashPassword(body.password);
      return deps.db.transaction(async (trx) => {
        if (await usersRepo.emailExists(trx, body.email)) {
          throw new AppError('email_taken', 'An account with this e-mail already exists.', [
            { path: 'body.email', message: 'An account with this e-mail already exists.' },
          ]);
        }
        const user = await usersRepo.insert(trx, { id: randomUUID(), ...body, passwordHash, now: deps.clock.now() });
        await audit(trx, deps.clock, caller, 'user.create', { type: 'user', id: user.id }, undefined, summary(user));
        return user;
      });
    },

    async update(caller: Caller, id: string, body: UpdateUserBody): Promise<User> {
      const me = requireManager(caller);
      const updated = await deps.db.transaction(async (trx) => {
        // Lock the active admins first, so two requests cannot remove the last two at once.
        await trx.raw("select id from users where role = 'admin' and active for update");
        const before = await usersRepo.findById(trx, id);
        if (!before) throw notFound('That user');
        if (id === me.id && (body.active === false || (body.role && body.role !== 'admin'))) {
          throw new AppError('conflict', 'You cannot deactivate yourself or remove your own admin role.');
        }
        const losesAdmin = before.role === 'admin' && before.active && (body.active === false || (body.role && body.role !== 'admin'));
        if (losesAdmin && (await usersRepo.countActiveAdmins(trx)) <= 1) {
          throw new AppError('conflict', 'The lab needs at least one active admin.');
        }
        const after = await usersRepo.update(trx, id, body, deps.clock.now());
        if (!after) throw notFound('That user');
        const action = body.active === false ? 'user.deactivate' : body.active === true && !before.active ? 'user.reactivate' : 'user.update';
        await audit(trx, deps.clock, caller, action, { type: 'user', id }, summary(before), summary(after));
        return after;
      });
      // A deactivated user's sessions end at once; a role change takes effect on the next request anyway.
      if (!updated.active) await deps.sessions.invalidateUserSessions(id);
      return updated;
    },
  };
}
export type UserService = ReturnType<typeof createUserService>;
