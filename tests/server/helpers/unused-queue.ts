import type { JobQueue } from '#server/queue/job-queue.ts';

/** For app tests that never queue a job (health, errors): any use fails the test loudly. */
export const unusedQueue: JobQueue = new Proxy({} as JobQueue, {
  get: (_t, prop) => () => {
    throw new Error(`this test's app was built without a job queue, yet ${String(prop)}() was called`);
  },
});
