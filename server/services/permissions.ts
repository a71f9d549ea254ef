import { can, type Capability } from '#shared/auth/capabilities.ts';
import { forbidden, unauthenticated } from '../core/app-error.ts';
import type { Caller } from '../core/caller.ts';

/**
 * The one permission check of the services. A signed-in user needs the capability for their
 * role; a visitor without a session is refused; the system (command line, worker, seed) acts
 * with the lab's own authority. Routes may refuse earlier, but this decides.
 */
export function assertCan(caller: Caller, capability: Capability): void {
  if (caller.kind === 'system') return;
  if (caller.kind === 'anonymous') throw unauthenticated();
  if (!can(caller.user.role, capability)) throw forbidden();
}
