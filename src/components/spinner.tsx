/** A quiet busy indicator with a readable label. */
export function Spinner({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" className="flex items-center gap-3 py-6 font-sans text-sm text-ink-soft">
      <span
        aria-hidden="true"
        className="inline-block size-5 animate-spin rounded-full border-2 border-signal border-r-transparent"
      />
      <span>{label}</span>
    </div>
  );
}
