import type { AuditAction } from '#shared/audit-actions.ts';
import type { Db } from '../db/knex.ts';
import { auditRepo } from '../db/repos/audit-repo.ts';
import { callerLabel, callerUser, type Caller } from '../core/caller.ts';
import type { Clock } from '../core/context.ts';

export interface AuditRecord {
  /** The action's transaction, so the row commits or rolls back with it. */
  trx: Db;
  clock: Clock;
  caller: Caller;
  action: AuditAction;
  entity: { type: string; id: string | null };
  before?: unknown;
  after?: unknown;
}

/** Writes one audit row for the caller's action; call inside the action's transaction. */
export function audit(r: AuditRecord): Promise<void> {
  return auditRepo.insert(r.trx, {
    actorUserId: callerUser(r.caller)?.id ?? null,
    actorLabel: callerLabel(r.caller),
    action: r.action,
    entityType: r.entity.type,
    entityId: r.entity.id,
    before: r.before,
    after: r.after,
    requestId: r.caller.requestId ?? null,
    at: r.clock.now(),
  });
}
