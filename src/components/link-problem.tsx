import type { ReactNode } from 'react';
import { isApiError } from '../lib/api-client.ts';
import { Alert } from './alert.tsx';

/**
 * What went wrong with an e-mailed link, in words: expired, used already, unknown (a link copied
 * in part), or the server away. `again` says how to get a new one.
 */
export function LinkProblem({ error, again }: { error: unknown; again: ReactNode }) {
  const code = isApiError(error) ? error.code : null;
  const title =
    code === 'token_expired'
      ? 'This link has expired'
      : code === 'token_used'
        ? 'This link has been used already'
        : code === 'not_found' || code === 'validation_failed'
          ? 'This link is not one we know'
          : 'Something went wrong';
  const detail =
    code === 'not_found' || code === 'validation_failed'
      ? 'Check that you opened the whole link from the e-mail.'
      : isApiError(error) && error.isUnreachable
        ? "Can't reach the server. Try again in a moment."
        : isApiError(error)
          ? error.message
          : null;
  return (
    <Alert tone="error" title={title}>
      {detail ? <p>{detail}</p> : null}
      <p className="mt-1">{again}</p>
    </Alert>
  );
}
