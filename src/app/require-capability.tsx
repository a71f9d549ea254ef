import type { ReactNode } from 'react';
import { can, ROLE_LABELS, type Capability } from '#shared/auth/capabilities.ts';
import { NotAllowed } from '../components/not-allowed.tsx';
import { useMe } from '../features/auth/api/get-me.ts';

/**
 * Shows `children` only to a role holding `capability`, and a plain refusal otherwise.
 * This hides; the server enforces (it answers 403 whatever the client shows).
 */
export function RequireCapability({
  capability,
  action,
  children,
}: {
  capability: Capability;
  /** Completes "Your role (Tester) cannot …". */
  action: string;
  children: ReactNode;
}) {
  const { data } = useMe();
  const user = data?.user;
  if (!user) return null; // the lab layout redirects signed-out visitors
  if (!can(user.role, capability)) return <NotAllowed roleLabel={ROLE_LABELS[user.role]} action={action} />;
  return <>{children}</>;
}
