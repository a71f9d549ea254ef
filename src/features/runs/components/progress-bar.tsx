/** A labelled progress bar; the numbers are in the text as well, so nothing rests on the bar alone. */
export function ProgressBar({ label, value, max, detail }: { label: string; value: number; max: number; detail: string }) {
  const pct = max > 0 ? Math.min(100, Math.round((value / max) * 100)) : 0;
  return (
    <div className="space-y-1">
      <div className="flex items-baseline justify-between gap-3 font-sans text-sm">
        <span className="font-semibold text-ink">{label}</span>
        <span className="text-ink-soft">{detail}</span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={max}
        aria-valuenow={value}
        aria-valuetext={detail}
        className="h-3 overflow-hidden rounded-full border border-rule bg-paper-sunk"
      >
        <div className="h-full bg-signal transition-[width] duration-300" style={{ width: `${pct}%` }} />
      </div>
    </div>
  );
}
