import { describe, expect, it } from 'vitest';
import { can } from '../auth/capabilities.ts';
import { RUN_STATUSES, RUN_TRANSITIONS, canTransition, runIsEditable } from './run-workflow.ts';

describe('run workflow', () => {
  it('follows draft → submitted → changes requested ↔ submitted → approved', () => {
    expect(canTransition('submit', 'draft')).toBe(true);
    expect(canTransition('submit', 'changes_requested')).toBe(true);
    expect(canTransition('request_changes', 'submitted')).toBe(true);
    expect(canTransition('approve', 'submitted')).toBe(true);
    for (const s of RUN_STATUSES.filter((x) => x !== 'submitted')) expect(canTransition('approve', s), s).toBe(false);
    expect(canTransition('submit', 'approved')).toBe(false);
  });
  it('gives testers submission and editors review; an approval is never by the measurer', () => {
    expect(can('tester', RUN_TRANSITIONS.submit.capability)).toBe(true);
    expect(can('tester', RUN_TRANSITIONS.approve.capability)).toBe(false);
    expect(can('editor', RUN_TRANSITIONS.approve.capability)).toBe(true);
    expect(RUN_TRANSITIONS.approve.notByMeasurer).toBe(true);
    expect(RUN_TRANSITIONS.request_changes.noteRequired).toBe(true);
  });
  it('lets files change only in a draft or a run sent back', () => {
    expect(RUN_STATUSES.filter(runIsEditable)).toEqual(['draft', 'changes_requested']);
  });
});
