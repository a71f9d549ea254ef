/**
 * The job queue: pg-boss 10 in the app's own PostgreSQL, behind this one module (the rest of the
 * server sees JobQueue). Payloads carry ids only; handlers must be idempotent because a job can
 * run twice (a retry after a crash). Jobs can be queued inside the caller's transaction, so they
 * exist exactly when the change that needs them commits.
 */
import PgBoss from 'pg-boss';
import type { Logger } from 'pino';
import type { Db } from '../db/knex.ts';
import { knexSqlAdapter } from '../db/knex-sql-adapter.ts';

/** Every queue, with how its jobs are retried and how long one may run before it counts as lost. */
export const QUEUES = {
  /** Parse and analyse one uploaded file. */
  'process-file': { policy: 'standard', retryLimit: 6, retryDelay: 2, retryBackoff: true, expireInSeconds: 20 },
  /** Recompute a run's figures and flags; one waiting per run at most. */
  'analyze-run': { policy: 'stately', retryLimit: 6, retryDelay: 2, retryBackoff: true, expireInSeconds: 120 },
  /**
   * One delivery attempt of one outbox message. The outbox schedules its own retries (a new job
   * with a later start); these settings only cover a handler that threw (the database away).
   */
  'send-mail': { policy: 'standard', retryLimit: 8, retryDelay: 5, retryBackoff: true, expireInSeconds: 120 },
  /**
   * Refund one paid pledge at the provider. While the provider is unreachable the job fails and
   * comes back after 2–4 s, then twice as long each time (pg-boss's backoff), 14 times: about
   * 9 to 18 hours in all, so an outage of a morning is ridden out; then it stays failed for an
   * admin (the ledger shows the pledge as being refunded).
   */
  'refund-pledge': { policy: 'standard', retryLimit: 14, retryDelay: 2, retryBackoff: true, expireInSeconds: 180 },
  /** Read a paid pledge's charge and the provider's fee on it (for the ledger); retried the same way. */
  'settle-pledge': { policy: 'standard', retryLimit: 14, retryDelay: 2, retryBackoff: true, expireInSeconds: 120 },
  /** The daily look for requests not tested within 180 days of reaching their goal; one waiting at most. */
  'sweep-funding': { policy: 'stately', retryLimit: 5, retryDelay: 60, retryBackoff: true, expireInSeconds: 600 },
} as const satisfies Record<string, { policy: PgBoss.QueuePolicy; retryLimit: number; retryDelay: number; retryBackoff: boolean; expireInSeconds: number }>;
export type QueueName = keyof typeof QUEUES;

export interface JobRequest {
  name: QueueName;
  data: Record<string, string>;
  /** Jobs with the same key in a 'stately' queue wait at most once. */
  singletonKey?: string;
  /** Not before this time (a retry's backoff). */
  startAfter?: Date;
}

export interface JobQueue {
  /** Queue jobs in the caller's transaction: they are visible only if it commits. */
  enqueue(trx: Db, jobs: readonly JobRequest[]): Promise<void>;
  /** Queue jobs outside any transaction. */
  send(jobs: readonly JobRequest[]): Promise<void>;
  /**
   * Handle jobs of one queue. The handler gets one job's data; a throw fails that job, which is
   * retried with backoff. `batchSize` jobs are fetched at once.
   */
  work(
    name: QueueName,
    options: { batchSize?: number; pollingIntervalSeconds?: number; concurrency?: number },
    handler: (data: Record<string, string>) => Promise<unknown>,
  ): Promise<void>;
  /** Jobs waiting or running in a queue (for progress and tests). */
  pending(name: QueueName): Promise<number>;
  stop(): Promise<void>;
}

export interface JobQueueOptions {
  databaseUrl: string;
  logger: Logger;
  /** The worker supervises (expires lost jobs, archives old ones); web processes only queue. */
  supervise: boolean;
  /** How often the supervisor looks for lost jobs, s (default 10). */
  maintenanceIntervalSeconds?: number;
}

export async function startJobQueue(options: JobQueueOptions): Promise<JobQueue> {
  const boss = new PgBoss({
    connectionString: options.databaseUrl,
    max: 4,
    supervise: options.supervise,
    schedule: false,
    migrate: true,
    maintenanceIntervalSeconds: options.maintenanceIntervalSeconds ?? 10,
  });
  boss.on('error', (err) => options.logger.warn({ err: err.message }, 'job queue error'));
  await boss.start();
  for (const [name, settings] of Object.entries(QUEUES)) {
    const existing = await boss.getQueue(name);
    if (!existing) await boss.createQueue(name, { name, ...settings });
  }
  const toInsert = (jobs: readonly JobRequest[]): PgBoss.JobInsert[] =>
    jobs.map((j) => ({
      name: j.name,
      data: j.data,
      ...(j.singletonKey ? { singletonKey: j.singletonKey } : {}),
      ...(j.startAfter ? { startAfter: j.startAfter } : {}),
    }));

  return {
    async enqueue(trx, jobs) {
      if (jobs.length > 0) await boss.insert(toInsert(jobs), { db: knexSqlAdapter(trx) });
    },
    async send(jobs) {
      if (jobs.length > 0) await boss.insert(toInsert(jobs));
    },
    async work(name, opts, handler) {
      await boss.work<Record<string, string>>(
        name,
        { batchSize: opts.batchSize ?? 1, pollingIntervalSeconds: opts.pollingIntervalSeconds ?? 0.5 },
        async (jobs) => {
          // Each job succeeds or fails on its own: one bad file must not retry its whole batch.
          // A few run at once, so one job's database round trips overlap another's parsing.
          const failed: string[] = [];
          let next = 0;
          const lane = async () => {
            while (next < jobs.length) {
              const job = jobs[next++];
              try {
                await handler(job.data);
              } catch (err) {
                options.logger.warn({ err: err instanceof Error ? err.message : String(err), queue: name, job: job.id }, 'job failed; it will be retried');
                failed.push(job.id);
              }
            }
          };
          await Promise.all(Array.from({ length: Math.max(1, Math.min(opts.concurrency ?? 1, jobs.length)) }, lane));
          const done = jobs.map((j) => j.id).filter((id) => !failed.includes(id));
          if (done.length > 0) await boss.complete(name, done);
          if (failed.length > 0) await boss.fail(name, failed);
        },
      );
    },
    async pending(name) {
      return boss.getQueueSize(name, { before: 'completed' });
    },
    async stop() {
      await boss.stop({ graceful: true, wait: true, timeout: 5000 });
    },
  };
}
