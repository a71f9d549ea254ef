import type { SessionUser } from '#shared/schemas/users.ts';

/** Who runs a command that no person signed in for ('payments': the provider's signed webhook). */
export type SystemLabel = 'cli' | 'worker' | 'seed' | 'payments';

interface CallerBase {
  /** Client address, for rate limits and logs; absent for system callers. */
  ip?: string;
  /** The request id of the web request, when there is one. */
  requestId?: string;
}

/**
 * Who is calling a service: a signed-in staff member, a visitor without a session (the public
 * site), or the system itself (command line, worker, seed). Services decide what each may do.
 */
export type Caller =
  | (CallerBase & { kind: 'user'; user: SessionUser })
  | (CallerBase & { kind: 'anonymous' })
  | (CallerBase & { kind: 'system'; label: SystemLabel });

export function systemCaller(label: SystemLabel): Caller {
  return { kind: 'system', label };
}

export function userCaller(user: SessionUser, extra: CallerBase = {}): Caller {
  return { kind: 'user', user, ...extra };
}

/** The signed-in user behind a caller, or null for visitors and the system. */
export function callerUser(caller: Caller): SessionUser | null {
  return caller.kind === 'user' ? caller.user : null;
}

/** A readable actor name for audit rows and logs: the user's e-mail, or "system:cli". */
export function callerLabel(caller: Caller): string {
  if (caller.kind === 'user') return caller.user.email;
  if (caller.kind === 'system') return `system:${caller.label}`;
  return 'anonymous';
}
