import { isApiError } from '../lib/api-client.ts';
import { Alert } from './alert.tsx';

/**
 * A save that failed for a reason no field explains: the server unreachable, a refusal, a slip of
 * ours. Field-level problems are shown beside their fields instead.
 */
export function SaveError({ error, what }: { error: unknown; what: string }) {
  if (!error) return null;
  const text = isApiError(error)
    ? error.isUnreachable
      ? `Can't reach the server. ${what} was not saved; try again in a moment.`
      : `${what} was not saved: ${error.message}`
    : `${what} was not saved. Try again.`;
  return <Alert tone="error">{text}</Alert>;
}
