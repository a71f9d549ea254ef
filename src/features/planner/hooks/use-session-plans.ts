import { useEffect, useRef, useState } from 'react';
import type { SessionPlanInput, SessionPlanResult } from '#shared/measurement/planner/types.ts';
import type { PlannerRequest, PlannerResponse } from '../worker/planner-messages.ts';

export type SessionPlansState =
  | { status: 'idle' }
  | { status: 'running'; previous: SessionPlanResult | null }
  | { status: 'done'; result: SessionPlanResult }
  | { status: 'error'; message: string };

const DEBOUNCE_MS = 150;

type Runner = { post(request: PlannerRequest): void; stop(): void };

/**
 * A web worker where the browser has one; otherwise (jsdom in the component tests) the same code
 * on the main thread, loaded on demand so the page bundle does not carry it.
 */
function startRunner(onAnswer: (answer: PlannerResponse) => void): Runner {
  if (typeof Worker !== 'undefined') {
    const worker = new Worker(new URL('../worker/planner.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (event: MessageEvent<PlannerResponse>) => onAnswer(event.data);
    worker.onerror = (event) => {
      event.preventDefault();
      onAnswer({ id: -1, ok: false, message: event.message || 'The planner could not start in this browser.' });
    };
    return { post: (request) => worker.postMessage(request), stop: () => worker.terminate() };
  }
  let stopped = false;
  return {
    post: ({ id, input }) => {
      import('../worker/run-planner.ts')
        .then(({ runPlanner }) => runPlanner(input))
        .then(
          (result) => !stopped && onAnswer({ id, ok: true, result }),
          (err: unknown) => !stopped && onAnswer({ id, ok: false, message: err instanceof Error ? err.message : String(err) }),
        );
    },
    stop: () => {
      stopped = true;
    },
  };
}

/**
 * Plans for the given input (null: nothing to plan, e.g. while a field is invalid). Only the
 * answer to the latest input is shown; while it is worked out, the previous plans stay on screen.
 */
export function useSessionPlans(input: SessionPlanInput | null): SessionPlansState {
  const [state, setState] = useState<SessionPlansState>({ status: 'idle' });
  const runner = useRef<Runner | null>(null);
  const latest = useRef(0);

  useEffect(() => {
    const started = startRunner((answer) => {
      if (answer.id !== latest.current && answer.id !== -1) return; // an older question
      setState(answer.ok ? { status: 'done', result: answer.result } : { status: 'error', message: answer.message });
    });
    runner.current = started;
    return () => {
      started.stop();
      runner.current = null;
    };
  }, []);

  useEffect(() => {
    const id = ++latest.current;
    if (!input) {
      setState({ status: 'idle' });
      return;
    }
    setState((s) => ({ status: 'running', previous: s.status === 'done' ? s.result : s.status === 'running' ? s.previous : null }));
    // A short pause, so typing a custom value plans once rather than once per keystroke.
    const timer = setTimeout(() => runner.current?.post({ id, input }), DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [input]);

  return state;
}
