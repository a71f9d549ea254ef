import { cn } from '#src/lib/cn.ts';

/** Readable or rejected, said in words with a mark, not by colour alone. */
export function CheckStatus({ ok }: { ok: boolean }) {
  return (
    <span
      className={cn(
        'inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 font-sans text-xs font-semibold',
        ok ? 'border-ok bg-ok-tint text-ok' : 'border-danger bg-danger-tint text-danger',
      )}
    >
      <span aria-hidden="true">{ok ? '✓' : '✕'}</span>
      {ok ? 'Readable' : 'Rejected'}
    </span>
  );
}

/** The per-file "reading…" state, before there is anything to show. */
export function ReadingNote() {
  return (
    <p className="flex items-center gap-2 font-sans text-sm text-ink-soft">
      <span
        aria-hidden="true"
        className="inline-block size-4 animate-spin rounded-full border-2 border-signal border-r-transparent"
      />
      Reading…
    </p>
  );
}
