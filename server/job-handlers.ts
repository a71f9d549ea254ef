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
}
