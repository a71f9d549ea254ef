/**
 * The planner's web worker: k placements solve a linear programme per distance, which would
 * hold the page for a second or more on the main thread.
 */
import type { PlannerRequest, PlannerResponse } from './planner-messages.ts';
import { runPlanner } from './run-planner.ts';

/** The part of a dedicated worker's global scope used here (the DOM typings have no worker scope). */
const scope = self as unknown as {
  onmessage: ((event: MessageEvent<PlannerRequest>) => void) | null;
  postMessage(message: PlannerResponse): void;
};

scope.onmessage = (event) => {
  const { id, input } = event.data;
  runPlanner(input).then(
    (result) => scope.postMessage({ id, ok: true, result }),
    (err: unknown) => scope.postMessage({ id, ok: false, message: err instanceof Error ? err.message : String(err) }),
  );
};
