import type { SessionPlanInput, SessionPlanResult } from '#shared/measurement/planner/types.ts';

/** Page → worker: plan this (the id pairs the answer with its question). */
export interface PlannerRequest {
  id: number;
  input: SessionPlanInput;
}

/** Worker → page. */
export type PlannerResponse = { id: number; ok: true; result: SessionPlanResult } | { id: number; ok: false; message: string };
