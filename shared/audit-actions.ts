/**
 * Every action the audit log records, by name. Services may write only these, so a report of
 * "who did what" never meets a name it does not know.
 */
export const AUDIT_ACTIONS = [
  'user.create',
  'user.update',
  'user.deactivate',
  'user.reactivate',
  'user.password_set',
  'user.sign_in',
  'user.sign_out',
  'maker.create',
  'maker.update',
  'model.create',
  'model.update',
  'unit.create',
  'unit.update',
  'instrument.create',
  'instrument.update',
  'run.create',
  'run.update',
  'run.upload',
  'run.submit',
  'run.request_changes',
  'run.approve',
  'run.comment',
  'reading.exclude',
  'reading.include',
  'run.publish',
  'report.create',
  'report.update',
  'report.publish',
  'report.correct',
  'report.retract',
  'payment_event.receive',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];
