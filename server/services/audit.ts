import type { Knex } from 'knex';
import { auditRepo } from '../db/repos/audit-repo.ts';
import type { Caller, Clock } from './context.ts';

/** Writes one audit row for the caller's action; call inside the action's transaction. */
export function audit(
  trx: Knex,
  clock: Clock,
  caller: Caller,
  action: string,
  entity: { type: string; id: string | null },
  before?: unknown,
  after?: unknown,
): Promise<void> {
  return auditRepo.insert(trx, {
    actorUserId: caller.user?.id ?? null,
    actorLabel: caller.user?.email ?? 'system',
    action,
    entityType: entity.type,
    entityId: entity.id,
    before,
    after,
    requestId: caller.requestId,
    at: clock.now(),
  });
}
