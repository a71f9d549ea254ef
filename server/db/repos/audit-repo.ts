import type { Knex } from 'knex';

export interface AuditEntry {
  actorUserId: string | null;
  /** Who acted, readable even after the account is gone: an e-mail or "system". */
  actorLabel: string;
  action: string;
  entityType: string;
  entityId: string | null;
  before?: unknown;
  after?: unknown;
  requestId?: string | null;
  at: Date;
}

export const auditRepo = {
  async insert(db: Knex, e: AuditEntry): Promise<void> {
    await db('audit_log').insert({
      actor_user_id: e.actorUserId,
      actor_label: e.actorLabel,
      action: e.action,
      entity_type: e.entityType,
      entity_id: e.entityId,
      before: e.before === undefined ? null : JSON.stringify(e.before),
      after: e.after === undefined ? null : JSON.stringify(e.after),
      request_id: e.requestId ?? null,
      created_at: e.at,
    });
  },

  async listFor(db: Knex, entityType: string, entityId: string) {
    return db('audit_log').where({ entity_type: entityType, entity_id: entityId }).orderBy('id');
  },
};
