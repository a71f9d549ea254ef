/**
 * Plans a session where the page asked: in the worker, or on the main thread where there is no
 * Worker. The LP solver loads once, and only when k placements are asked for.
 */
import highsWasmUrl from 'highs/runtime?url';
import { loadHighsSolver } from '#shared/measurement/planner/highs-solver.ts';
import type { LpSolver } from '#shared/measurement/planner/lp-solver.ts';
import { planSession } from '#shared/measurement/planner/plan-session.ts';
import { PLAN_STRATEGIES, type SessionPlanInput, type SessionPlanResult } from '#shared/measurement/planner/types.ts';

let solver: Promise<LpSolver> | null = null;

/**
 * The bundler moves highs.wasm, so a browser is given its URL. On Node (the component tests run
 * React in jsdom on Node) the solver package reads the file beside itself, where that URL would
 * point nowhere.
 */
function loadSolver(): Promise<LpSolver> {
  const onNode = typeof process !== 'undefined' && Boolean(process.versions?.node);
  solver ??= loadHighsSolver(onNode ? {} : { wasmUrl: highsWasmUrl }).catch((err: unknown) => {
    solver = null; // let a later request try again
    throw err;
  });
  return solver;
}

export async function runPlanner(input: SessionPlanInput): Promise<SessionPlanResult> {
  const needsSolver = (input.strategies ?? PLAN_STRATEGIES).includes('placements');
  return planSession(input, needsSolver ? await loadSolver() : null);
}
