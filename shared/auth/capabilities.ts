/**
 * Roles and what each may do: the one map both sides read. The server enforces it
 * (server/http/require-capability.ts); the client uses it only to hide what a role cannot do.
 */
export const ROLES = ['tester', 'editor', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const CAPABILITIES = [
  'lab.enter', // see the staff area at /lab
  'catalog.manage', // makers, models, units, instruments
  'runs.create',
  'runs.upload',
  'runs.review', // request changes, approve (never a run one measured: a row-level rule)
  'reports.publish', // publish, correct, retract
  'users.manage', // invite staff, set roles, deactivate
  'requests.triage', // readers' test requests: plan, decline, mark tested, merge, set a funding goal
  'mail.manage', // the send log (and sending a failed message again); the mailbox while the local fake runs
  'settings.manage',
  'ledger.read', // every payment, refund and fee; the CSV export and the reconciliation with the provider
] as const;
export type Capability = (typeof CAPABILITIES)[number];

const tester: readonly Capability[] = ['lab.enter', 'catalog.manage', 'runs.create', 'runs.upload'];
const editor: readonly Capability[] = [...tester, 'runs.review', 'reports.publish', 'requests.triage'];
const admin: readonly Capability[] = CAPABILITIES;

export const ROLE_CAPABILITIES: Readonly<Record<Role, readonly Capability[]>> = {
  tester,
  editor,
  admin,
};

export function can(role: Role | null | undefined, capability: Capability): boolean {
  if (!role) return false;
  return ROLE_CAPABILITIES[role].includes(capability);
}

export const ROLE_LABELS: Readonly<Record<Role, string>> = {
  tester: 'Tester',
  editor: 'Editor',
  admin: 'Admin',
};
