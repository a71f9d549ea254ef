import { Alert } from './alert.tsx';
import { isApiError } from '../lib/api-client.ts';
import { minutesFromSeconds } from '../lib/format.ts';

/** Why a reader's request did not go through, in words (field problems are shown by their fields). */
export function RequestError({ error }: { error: unknown }) {
  if (!error) return null;
  let text = 'That did not work. Try again in a moment.';
  if (isApiError(error)) {
    if (error.isUnreachable) text = "Can't reach the server. Nothing was sent; try again in a moment.";
    else if (error.code === 'rate_limited') text = `Too many requests from your network. Try again in ${minutesFromSeconds(error.retryAfterSeconds ?? 3600)}.`;
    else text = error.message;
  }
  return <Alert tone="error">{text}</Alert>;
}
