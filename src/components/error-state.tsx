import { isApiError } from '../lib/api-client.ts';
import { Button } from './button.tsx';
import { PageHeader } from './page-header.tsx';

/** A full-page failure: says whether the server was unreachable or what went wrong, offers a retry. */
export function ErrorState({ error, onRetry }: { error: unknown; onRetry?: () => void }) {
  const unreachable = isApiError(error) ? error.isUnreachable : error instanceof TypeError;
  const title = unreachable ? "Can't reach the server" : 'Something went wrong';
  const message = unreachable
    ? 'Benchlight could not get an answer from its server. It may be starting up or down. Try again in a moment.'
    : isApiError(error)
      ? error.message
      : 'An unexpected error stopped this page. Try again; if it keeps happening, tell the lab admin.';
  return (
    <div className="max-w-measure">
      <PageHeader title={title} />
      <p className="text-lg text-ink-soft">{message}</p>
      {onRetry ? (
        <div className="mt-6">
          <Button onClick={onRetry}>Try again</Button>
        </div>
      ) : null}
    </div>
  );
}
