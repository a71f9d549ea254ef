import type { Knex } from 'knex';
import type { Role } from '#shared/auth/capabilities.ts';
import type { Invitation } from '#shared/schemas/invitations.ts';
import { iso } from './list-page.ts';

function toInvitation(r: any): Invitation {
  return {
    id: r.id,
    email: r.email,
    displayName: r.display_name,
    role: r.role,
    status: r.status,
    invitedBy: r.invited_by_name ?? null,
    expiresAt: iso(r.expires_at)!,
    createdAt: iso(r.created_at)!,
    acceptedAt: iso(r.accepted_at),
  };
}

const withInviter = (db: Knex) => db('staff_invitations as i').leftJoin('users as u', 'u.id', 'i.invited_by').select('i.*', 'u.display_name as invited_by_name');

export const invitationsRepo = {
  async insert(db: Knex, i: { id: string; email: string; displayName: string; role: Role; invitedBy: string | null; expiresAt: Date; now: Date }): Promise<void> {
    await db('staff_invitations').insert({
      id: i.id,
      email: i.email,
      display_name: i.displayName,
      role: i.role,
      status: 'pending',
      invited_by: i.invitedBy,
      expires_at: i.expiresAt,
      created_at: i.now,
    });
  },

  async find(db: Knex, id: string, opts: { lock?: boolean } = {}): Promise<Invitation | null> {
    const q = withInviter(db).where('i.id', id);
    if (opts.lock) q.forUpdate('i');
    const r = await q.first();
    return r ? toInvitation(r) : null;
  },

  /** Pending invitations first (newest first), then the last 50 settled ones. */
  async list(db: Knex): Promise<Invitation[]> {
    const pending = await withInviter(db).where('i.status', 'pending').orderBy('i.created_at', 'desc');
    const settled = await withInviter(db).whereNot('i.status', 'pending').orderBy('i.created_at', 'desc').limit(50);
    return [...pending, ...settled].map(toInvitation);
  },

  /** Revokes the pending invitations of an address (a new one replaces them); returns their ids. */
  async revokePendingFor(db: Knex, email: string, now: Date): Promise<string[]> {
    const rows = await db('staff_invitations').where({ status: 'pending' }).whereRaw('lower(email) = lower(?)', [email]).update({ status: 'revoked', revoked_at: now }).returning('id');
    return rows.map((r: { id: string }) => r.id);
  },

  async setStatus(db: Knex, id: string, status: 'accepted' | 'revoked', now: Date, userId?: string): Promise<boolean> {
    const n = await db('staff_invitations')
      .where({ id, status: 'pending' })
      .update({ status, ...(status === 'accepted' ? { accepted_at: now, user_id: userId ?? null } : { revoked_at: now }) });
    return n > 0;
  },
};
