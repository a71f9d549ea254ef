/**
 * The run workflow as an explicit state machine: each transition names the states it leaves
 * from, the state it reaches and the capability it needs. The server applies a transition as
 * one conditional update from an expected state plus an audit row; the client reads the same
 * table to decide which buttons to show.
 */
import type { Capability } from '../auth/capabilities.ts';

export const RUN_STATUSES = ['draft', 'submitted', 'changes_requested', 'approved', 'published'] as const;
export type RunStatus = (typeof RUN_STATUSES)[number];

export const RUN_STATUS_LABELS: Readonly<Record<RunStatus, string>> = {
  draft: 'Draft',
  submitted: 'Submitted',
  changes_requested: 'Changes requested',
  approved: 'Approved',
  published: 'Published',
};

export interface RunTransition {
  from: readonly RunStatus[];
  to: RunStatus;
  capability: Capability;
  /** A note (why) must be given. */
  noteRequired: boolean;
  /** The person who measured the run may not take this step (an editor never approves their own run). */
  notByMeasurer: boolean;
}

export const RUN_TRANSITIONS = {
  submit: { from: ['draft', 'changes_requested'], to: 'submitted', capability: 'runs.upload', noteRequired: false, notByMeasurer: false },
  request_changes: { from: ['submitted'], to: 'changes_requested', capability: 'runs.review', noteRequired: true, notByMeasurer: false },
  approve: { from: ['submitted'], to: 'approved', capability: 'runs.review', noteRequired: false, notByMeasurer: true },
  /** Taken by the reports service when a report over the run is first published. */
  publish: { from: ['approved'], to: 'published', capability: 'reports.publish', noteRequired: false, notByMeasurer: false },
} as const satisfies Record<string, RunTransition>;
export type RunTransitionName = keyof typeof RUN_TRANSITIONS;

/** States in which the run's files, readings and conditions may still change. */
export const EDITABLE_RUN_STATUSES: readonly RunStatus[] = ['draft', 'changes_requested'];

export function runIsEditable(status: RunStatus): boolean {
  return EDITABLE_RUN_STATUSES.includes(status);
}

export function canTransition(name: RunTransitionName, status: RunStatus): boolean {
  return (RUN_TRANSITIONS[name].from as readonly RunStatus[]).includes(status);
}
