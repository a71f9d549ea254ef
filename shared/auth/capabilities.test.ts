import { describe, expect, it } from 'vitest';
import { CAPABILITIES, ROLES, can } from './capabilities.ts';

// Roles nest: tester < editor < admin; review and publication are editors', users are admins'.
describe('capability map', () => {
  it('gives every role the staff area', () => {
    for (const role of ROLES) expect(can(role, 'lab.enter')).toBe(true);
  });
  it('keeps review and publication from testers', () => {
    expect(can('tester', 'runs.review')).toBe(false);
    expect(can('tester', 'reports.publish')).toBe(false);
    expect(can('editor', 'runs.review')).toBe(true);
    expect(can('editor', 'reports.publish')).toBe(true);
  });
  it('gives editors the triage of test requests and keeps the mail log for admins', () => {
    expect(can('tester', 'requests.triage')).toBe(false);
    expect(can('editor', 'requests.triage')).toBe(true);
    expect(can('editor', 'mail.manage')).toBe(false);
    expect(can('admin', 'mail.manage')).toBe(true);
  });
  it('keeps the ledger for admins', () => {
    expect(can('tester', 'ledger.read')).toBe(false);
    expect(can('editor', 'ledger.read')).toBe(false);
    expect(can('admin', 'ledger.read')).toBe(true);
  });
  it('keeps user management for admins', () => {
    expect(can('tester', 'users.manage')).toBe(false);
    expect(can('editor', 'users.manage')).toBe(false);
    expect(can('admin', 'users.manage')).toBe(true);
  });
  it('gives admins everything and signed-out callers nothing', () => {
    for (const c of CAPABILITIES) {
      expect(can('admin', c)).toBe(true);
      expect(can(null, c)).toBe(false);
    }
  });
});
