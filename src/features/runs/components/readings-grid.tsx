import type { Reading } from '#shared/schemas/runs.ts';
import { cn } from '#src/lib/cn.ts';
import { formatFigure, formatLength } from '#src/lib/format.ts';

const STATE_TEXT: Record<Reading['state'], string> = {
  missing: 'missing',
  pending: 'analysing',
  analysed: '',
  failed: 'error',
  excluded: 'excluded',
};

const STATE_CLASS: Record<Reading['state'], string> = {
  missing: 'bg-paper-sunk text-ink-muted',
  pending: 'bg-signal-tint text-signal-strong',
  analysed: 'bg-paper-raised text-ink',
  failed: 'bg-danger-tint text-danger',
  excluded: 'bg-paper-sunk text-ink-muted line-through',
};

/**
 * One plane's readings laid out as on the bench (rows by y, top = highest; columns by x), each a
 * button that opens the reading. The cell says its state in words; the value is the combined band.
 */
export function ReadingsGrid({
  readings,
  distanceCm,
  selectedId,
  flagged,
  onSelect,
}: {
  readings: readonly Reading[];
  distanceCm: number;
  selectedId: string | null;
  flagged: ReadonlySet<string>;
  onSelect: (id: string) => void;
}) {
  const plane = readings.filter((r) => r.slot === 'grid' && r.distanceCm === distanceCm);
  const xs = [...new Set(plane.map((r) => r.xCm))].sort((a, b) => a - b);
  const ys = [...new Set(plane.map((r) => r.yCm))].sort((a, b) => b - a);
  const at = new Map(plane.map((r) => [`${r.xCm}|${r.yCm}`, r]));
  const checks = readings.filter((r) => r.slot !== 'grid' && r.distanceCm === distanceCm);
  return (
    <div className="space-y-3">
      <div role="region" aria-label={`Readings at ${formatLength(distanceCm)} cm`} tabIndex={0} className="overflow-x-auto">
        <table className="border-collapse font-sans text-xs tabular-nums">
          <caption className="pb-2 text-left text-sm font-semibold text-ink">
            Readings at {formatLength(distanceCm)} cm, combined band in mW/cm² (rows: y, columns: x, in cm)
          </caption>
          <thead>
            <tr>
              <th scope="col" className="px-2 py-1 text-right text-ink-soft">
                y \ x
              </th>
              {xs.map((x) => (
                <th key={x} scope="col" className="border-b border-rule px-2 py-1 text-right">
                  {formatLength(x)}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {ys.map((y) => (
              <tr key={y}>
                <th scope="row" className="border-r border-rule px-2 py-1 text-right">
                  {formatLength(y)}
                </th>
                {xs.map((x) => {
                  const r = at.get(`${x}|${y}`);
                  if (!r) return <td key={x} />;
                  const value = r.values.combined;
                  const label = `${formatLength(distanceCm)} cm, x ${formatLength(x)}, y ${formatLength(y)}: ${
                    r.state === 'analysed' && value !== null && value !== undefined ? `${formatFigure(value)} mW/cm²` : STATE_TEXT[r.state]
                  }${flagged.has(r.id) ? ', flagged' : ''}${r.commentCount ? `, ${r.commentCount} comment${r.commentCount > 1 ? 's' : ''}` : ''}`;
                  return (
                    <td key={x} className="p-0.5">
                      <button
                        type="button"
                        aria-label={label}
                        aria-pressed={selectedId === r.id}
                        onClick={() => onSelect(r.id)}
                        className={cn(
                          'min-h-9 min-w-14 rounded border px-1.5 text-right',
                          STATE_CLASS[r.state],
                          selectedId === r.id ? 'border-signal ring-2 ring-signal' : flagged.has(r.id) ? 'border-warn' : 'border-rule',
                        )}
                      >
                        {r.state === 'analysed' && value !== null && value !== undefined ? formatFigure(value) : STATE_TEXT[r.state]}
                        {flagged.has(r.id) ? <span aria-hidden="true"> ⚑</span> : null}
                        {r.commentCount ? <span aria-hidden="true"> ✎</span> : null}
                      </button>
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {checks.length ? (
        <p className="font-sans text-xs text-ink-soft">
          Centre readings for the drift check:{' '}
          {checks.map((c) => (
            <button key={c.id} type="button" className="mr-2 underline" onClick={() => onSelect(c.id)}>
              {c.slot === 'center_start' ? 'start' : 'end'} ({c.state === 'analysed' && c.values.combined !== null ? `${formatFigure(c.values.combined ?? 0)} mW/cm²` : STATE_TEXT[c.state]})
            </button>
          ))}
        </p>
      ) : null}
      <p className="font-sans text-xs text-ink-muted">⚑ flagged · ✎ commented · “missing” has no file yet · “error” could not be read</p>
    </div>
  );
}
