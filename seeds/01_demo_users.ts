import type { Knex } from 'knex';
import { randomUUID } from 'node:crypto';
import { hashPassword } from '../server/auth/password.ts';
import { DEMO_USERS } from './data/demo-users.ts';

/** Demo accounts, one per role (listed in the README). Never in production. */
export async function seed(knex: Knex): Promise<void> {
  if (process.env.NODE_ENV === 'production') {
    throw new Error('The demo seed refuses to run with NODE_ENV=production: it creates accounts with published passwords.');
  }
  for (const u of DEMO_USERS) {
    const passwordHash = await hashPassword(u.password);
    const existing = await knex('users').whereRaw('lower(email) = lower(?)', [u.email]).first('id');
    if (existing) {
      await knex('users').where({ id: existing.id }).update({
        display_name: u.displayName, role: u.role, active: true, password_hash: passwordHash, updated_at: knex.fn.now(),
      });
    } else {
      await knex('users').insert({
        id: randomUUID(), email: u.email, display_name: u.displayName, role: u.role, active: true, password_hash: passwordHash,
      });
    }
  }
}
