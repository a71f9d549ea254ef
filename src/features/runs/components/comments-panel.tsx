import { useState } from 'react';
import type { Reading } from '#shared/schemas/runs.ts';
import { Button } from '#src/components/button.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { formatDate } from '#src/lib/format.ts';
import { useAddComment, useComments } from '../api/comments.ts';
import { readingName } from './reading-detail.tsx';

/** Comments on the run and on single readings, oldest first, and a box to add one. */
export function CommentsPanel({ runId, selected }: { runId: string; selected: Reading | null }) {
  const comments = useComments(runId);
  const add = useAddComment(runId);
  const [body, setBody] = useState('');
  const [onReading, setOnReading] = useState(true);
  const [error, setError] = useState<string | null>(null);
  const target = onReading && selected ? selected : null;
  return (
    <section aria-labelledby="comments-heading" className="space-y-4">
      <h2 id="comments-heading" className="text-xl font-semibold">
        Comments
      </h2>
      {comments.data?.length ? (
        <ol className="space-y-3">
          {comments.data.map((c) => (
            <li key={c.id} className="rounded border border-rule bg-paper-raised px-4 py-3">
              <p className="font-sans text-xs text-ink-muted">
                {c.author.displayName}, {formatDate(c.createdAt)}
                {c.point ? ` — on the reading at ${readingName(c.point)}` : ' — on the run'}
              </p>
              <p className="mt-1 whitespace-pre-wrap">{c.body}</p>
            </li>
          ))}
        </ol>
      ) : (
        <p className="font-sans text-sm text-ink-soft">No comments yet.</p>
      )}
      <form
        className="space-y-2"
        onSubmit={(e) => {
          e.preventDefault();
          if (!body.trim()) return setError('Write the comment first.');
          setError(null);
          add.mutate(
            { body: body.trim(), readingId: target?.id ?? null },
            { onSuccess: () => setBody(''), onError: (err) => setError(isApiError(err) ? err.message : 'The comment was not saved.') },
          );
        }}
      >
        <label htmlFor="comment-body" className="block font-sans text-sm font-semibold">
          Add a comment
        </label>
        <textarea
          id="comment-body"
          value={body}
          onChange={(e) => setBody(e.target.value)}
          rows={3}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? 'comment-error' : undefined}
          className="block w-full max-w-2xl rounded border border-control bg-paper-raised px-3 py-2"
        />
        {error ? (
          <p id="comment-error" className="font-sans text-sm font-semibold text-danger">
            {error}
          </p>
        ) : null}
        {selected ? (
          <label className="flex items-center gap-2 font-sans text-sm">
            <input type="checkbox" checked={onReading} onChange={(e) => setOnReading(e.target.checked)} />
            About the reading at {readingName(selected)}
          </label>
        ) : null}
        <Button type="submit" variant="secondary" pending={add.isPending}>
          Add comment
        </Button>
      </form>
    </section>
  );
}
