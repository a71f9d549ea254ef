import { createHash } from 'node:crypto';
import type { Db } from '../db/knex.ts';
import { readingsRepo } from '../db/repos/readings-repo.ts';

/**
 * What a run's figures depend on, digested: its bands and each reading's current file, analysis
 * state and exclusion. Stored with the figures; a different digest now means they are stale.
 */
export async function runFingerprint(db: Db, runId: string, bands: unknown): Promise<string> {
  const parts = await readingsRepo.fingerprintParts(db, runId);
  return createHash('sha256').update(JSON.stringify(bands)).update('\n').update(parts.join('\n')).digest('hex');
}
