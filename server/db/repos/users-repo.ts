import type { Knex } from 'knex';
import type { Role } from '#shared/auth/capabilities.ts';
import type { User } from '#shared/schemas/users.ts';

interface UserRecord {
  id: string;
  email: string;
  display_name: string;
  role: Role;
  active: boolean;
  password_hash: string;
  created_at: Date;
  updated_at: Date;
}

const publicColumns = ['id', 'email', 'display_name', 'role', 'active', 'created_at', 'updated_at'] as const;

export function toUser(row: Omit<UserRecord, 'password_hash'>): User {
  return {
    id: row.id,
    email: row.email,
    displayName: row.display_name,
    role: row.role,
    active: row.active,
    createdAt: new Date(row.created_at).toISOString(),
    updatedAt: new Date(row.updated_at).toISOString(),
  };
}

export const usersRepo = {
  async list(db: Knex): Promise<User[]> {
    const rows = await db('users').select(publicColumns).orderBy([{ column: 'active', order: 'desc' }, 'email']);
    return rows.map(toUser);
  },

  async findById(db: Knex, id: string): Promise<User | null> {
    const row = await db('users').select(publicColumns).where({ id }).first();
    return row ? toUser(row) : null;
  },

  /** Includes the hash: only the sign-in service calls this. */
  async findCredentialsByEmail(db: Knex, email: string): Promise<(User & { passwordHash: string }) | null> {
    const row: UserRecord | undefined = await db('users').whereRaw('lower(email) = lower(?)', [email]).first();
    return row ? { ...toUser(row), passwordHash: row.password_hash } : null;
  },

  async emailExists(db: Knex, email: string): Promise<boolean> {
    const row = await db('users').whereRaw('lower(email) = lower(?)', [email]).first('id');
    return Boolean(row);
  },

  async insert(
    db: Knex,
    user: { id: string; email: string; displayName: string; role: Role; passwordHash: string; now: Date },
  ): Promise<User> {
    const [row] = await db('users')
      .insert({
        id: user.id,
        email: user.email,
        display_name: user.displayName,
        role: user.role,
        password_hash: user.passwordHash,
        active: true,
        created_at: user.now,
        updated_at: user.now,
      })
      .returning(publicColumns);
    return toUser(row);
  },

  async update(db: Knex, id: string, changes: { role?: Role; active?: boolean; displayName?: string }, now: Date): Promise<User | null> {
    const [row] = await db('users')
      .where({ id })
      .update({
        ...(changes.role !== undefined ? { role: changes.role } : {}),
        ...(changes.active !== undefined ? { active: changes.active } : {}),
        ...(changes.displayName !== undefined ? { display_name: changes.displayName } : {}),
        updated_at: now,
      })
      .returning(publicColumns);
    return row ? toUser(row) : null;
  },

  async setPassword(db: Knex, id: string, passwordHash: string, now: Date): Promise<void> {
    await db('users').where({ id }).update({ password_hash: passwordHash, updated_at: now });
  },

  /** Row-locks every active admin until the transaction ends (see the users service's update). */
  async lockActiveAdmins(trx: Knex): Promise<void> {
    await trx('users').select('id').where({ role: 'admin', active: true }).forUpdate();
  },

  async findIdByEmail(db: Knex, email: string): Promise<string | null> {
    const row = await db('users').whereRaw('lower(email) = lower(?)', [email]).first('id');
    return row ? row.id : null;
  },

  async countActiveAdmins(db: Knex): Promise<number> {
    const row = await db('users').where({ role: 'admin', active: true }).count<{ count: number }>('id as count').first();
    return Number(row?.count ?? 0);
  },
};
