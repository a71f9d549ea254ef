import { isApiError } from '../lib/api-client.ts';
import { Button } from './button.tsx';
import { PageHeader } from './page-header.tsx';

/**
 * A failure: says whether the server was unreachable or what went wrong, and offers a retry.
 * As a page (default) it carries the h1; `inline` puts it inside a page that already has one.
 */
export function ErrorState({
  error,
  onRetry,
  inline = false,
  title: fallbackTitle = 'Something went wrong',
}: {
  error: unknown;
  /** Heading when the server did answer (an unreachable server always says so). */
  title?: string;
  onRetry?: () => void;
  inline?: boolean;
}) {
  const unreachable = isApiError(error) ? error.isUnreachable : error instanceof TypeError;
  const title = unreachable ? "Can't reach the server" : fallbackTitle;
  const message = unreachable
    ? 'Benchlight could not get an answer from its server. It may be starting up or down. Try again in a moment.'
    : isApiError(error)
      ? error.message
      : 'An unexpected error stopped this page. Try again; if it keeps happening, tell the lab admin.';
  return (
    <div role={inline ? 'alert' : undefined} className="max-w-measure">
      {inline ? (
        <h2 className="text-xl font-semibold">{title}</h2>
      ) : (
        <PageHeader title={title} />
      )}
      <p className="mt-2 text-lg text-ink-soft">{message}</p>
      {onRetry ? (
        <div className="mt-6">
          <Button onClick={onRetry}>Try again</Button>
        </div>
      ) : null}
    </div>
  );
}
