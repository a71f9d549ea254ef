import type { Capability, Role } from '#shared/auth/capabilities.ts';
import { can } from '#shared/auth/capabilities.ts';

/**
 * The staff area's sections: one list feeds the router (routes and their guards) and the lab
 * navigation. The server enforces each capability; the client only hides and explains.
 */
export interface LabSection {
  /** Path under /lab ('' for the overview). */
  path: string;
  label: string;
  capability: Capability;
  /** Completes "Your role (Tester) cannot …" on the refusal page. */
  action: string;
  load: () => Promise<unknown>;
  /** Listed in the lab navigation (sub-pages such as a run's page are not). */
  inNav: boolean;
  /** Listed only while the server says so (the Mailbox exists only while the local fake SMTP runs). */
  shownWhen?: 'fakeMailbox';
}

/** What the server told the client about its set-up (GET /api/lab/settings). */
export interface LabNavFlags {
  fakeMailbox?: boolean;
}

export const LAB_SECTIONS: readonly LabSection[] = [
  { path: '', label: 'Overview', capability: 'lab.enter', action: 'use the staff area', inNav: true, load: () => import('./routes/lab/overview.tsx') },
  { path: 'runs', label: 'Runs', capability: 'lab.enter', action: 'see runs', inNav: true, load: () => import('./routes/lab/runs.tsx') },
  { path: 'runs/new', label: 'New run', capability: 'runs.create', action: 'create runs', inNav: false, load: () => import('./routes/lab/run-new.tsx') },
  { path: 'runs/:runId', label: 'Run', capability: 'lab.enter', action: 'see runs', inNav: false, load: () => import('./routes/lab/run.tsx') },
  { path: 'check', label: 'File check', capability: 'runs.upload', action: 'check instrument files', inNav: true, load: () => import('./routes/lab/file-check.tsx') },
  { path: 'catalog', label: 'Catalog', capability: 'catalog.manage', action: 'manage the catalog', inNav: true, load: () => import('./routes/lab/catalog.tsx') },
  { path: 'reports/:id/preview', label: 'Report preview', capability: 'reports.publish', action: 'preview reports', inNav: false, load: () => import('./routes/lab/report-preview.tsx') },
  { path: 'review', label: 'Review', capability: 'runs.review', action: 'review runs', inNav: true, load: () => import('./routes/lab/review.tsx') },
  { path: 'reports', label: 'Reports', capability: 'lab.enter', action: 'see reports', inNav: true, load: () => import('./routes/lab/reports.tsx') },
  { path: 'reports/new', label: 'New report', capability: 'reports.publish', action: 'make reports', inNav: false, load: () => import('./routes/lab/report-new.tsx') },
  { path: 'reports/:reportId', label: 'Report', capability: 'lab.enter', action: 'see reports', inNav: false, load: () => import('./routes/lab/report.tsx') },
  { path: 'requests', label: 'Test requests', capability: 'requests.triage', action: 'triage test requests', inNav: true, load: () => import('./routes/lab/test-requests.tsx') },
  { path: 'admin/users', label: 'Users', capability: 'users.manage', action: 'manage users', inNav: true, load: () => import('./routes/lab/users.tsx') },
  { path: 'ledger', label: 'Ledger', capability: 'ledger.read', action: 'read the ledger', inNav: true, load: () => import('./routes/lab/ledger.tsx') },
  { path: 'admin/mail', label: 'Send log', capability: 'mail.manage', action: 'read the send log', inNav: true, load: () => import('./routes/lab/mail.tsx') },
  { path: 'admin/mailbox', label: 'Mailbox', capability: 'mail.manage', action: 'read the mailbox', inNav: true, shownWhen: 'fakeMailbox', load: () => import('./routes/lab/mailbox.tsx') },
];

/** The sections a role sees in the lab navigation, with their full paths. */
export function labNavFor(role: Role, flags: LabNavFlags = {}): { to: string; label: string; end: boolean }[] {
  return LAB_SECTIONS.filter((s) => s.inNav && can(role, s.capability) && (!s.shownWhen || flags[s.shownWhen])).map((s) => ({
    to: s.path ? `/lab/${s.path}` : '/lab',
    label: s.label,
    end: s.path === '',
  }));
}
