import type { Logger } from 'pino';
import { systemCaller } from './core/caller.ts';
import type { JobQueue } from './queue/job-queue.ts';
import type { Services } from './services/index.ts';

/** What each queue's jobs do; the worker process registers these (and so do the tests). */
export async function registerJobHandlers(queue: JobQueue, services: Services, logger: Logger): Promise<void> {
  const worker = systemCaller('worker');
  await queue.work('process-file', { batchSize: 100, pollingIntervalSeconds: 0.5, concurrency: 4 }, async ({ fileId }) => {
    const outcome = await services.runProcessing.processFile(worker, fileId);
    logger.debug({ fileId, outcome }, 'file processed');
  });
  await queue.work('analyze-run', { batchSize: 1, pollingIntervalSeconds: 0.5 }, async ({ runId }) => {
    const started = Date.now();
    const outcome = await services.runProcessing.analyzeRun(worker, runId);
    logger.debug({ runId, outcome, ms: Date.now() - started }, 'run analysis');
  });
  // One delivery attempt per job; the outbox row says whether there is anything left to do.
  await queue.work('send-mail', { batchSize: 10, pollingIntervalSeconds: 0.5, concurrency: 4 }, async ({ outboxId }) => {
    const outcome = await services.outbox.deliver(worker, outboxId);
    logger.debug({ outboxId, outcome }, 'mail delivery');
  });
  // Readers' money: each refund, each payment's fee, and the daily look for requests not tested in
  // time. A provider that cannot be reached makes the job throw; the queue retries it with backoff.
  await queue.work('refund-pledge', { batchSize: 5, pollingIntervalSeconds: 0.5, concurrency: 2 }, async ({ pledgeId }) => {
    const outcome = await services.pledges.refund(worker, pledgeId);
    logger.info({ pledgeId, outcome }, 'pledge refund');
  });
  await queue.work('settle-pledge', { batchSize: 5, pollingIntervalSeconds: 0.5, concurrency: 2 }, async ({ pledgeId }) => {
    const outcome = await services.pledges.settle(worker, pledgeId);
    logger.debug({ pledgeId, outcome }, 'pledge settled');
  });
  await queue.work('sweep-funding', { batchSize: 1, pollingIntervalSeconds: 2 }, async () => {
    const outcome = await services.pledges.sweep(worker);
    if (outcome.requests > 0) logger.info(outcome, 'requests not tested in time: pledges refunded');
  });
}

/**
 * Queues the funding sweep once a day (and at start): several workers may each queue it, the
 * queue keeps one waiting at most and the sweep finds nothing the second time. Returns a stop.
 */
export function startFundingSweep(queue: JobQueue, logger: Logger, intervalMs = 24 * 60 * 60 * 1000): () => void {
  const run = () =>
    queue.send([{ name: 'sweep-funding', data: {}, singletonKey: 'daily' }]).catch((err: unknown) =>
      logger.warn({ err: err instanceof Error ? err.message : String(err) }, 'could not queue the funding sweep; next time again'),
    );
  void run();
  const timer = setInterval(run, intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}

/**
 * The outbox's housekeeping, every minute in the worker: messages left "sending" by a worker
 * that died become failed (never resent by themselves), lost jobs of queued ones are replaced.
 * Returns a function that stops it.
 */
export function startOutboxSweep(services: Services, logger: Logger, intervalMs = 60_000): () => void {
  const worker = systemCaller('worker');
  const run = () =>
    services.outbox.sweep(worker).catch((err: unknown) => logger.warn({ err: err instanceof Error ? err.message : String(err) }, 'outbox sweep failed; next minute again'));
  void run();
  const timer = setInterval(run, intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
