import { Link } from 'react-router-dom';
import type { Run } from '#shared/schemas/runs.ts';
import { formatCount, formatDate } from '#src/lib/format.ts';
import { RunStatusBadge } from './run-status-badge.tsx';

/** Runs as a table: the unit, the instrument, who measured, the state and the progress. */
export function RunsTable({ runs, caption, meId }: { runs: readonly Run[]; caption: string; meId?: string }) {
  if (runs.length === 0) return <p className="font-sans text-sm text-ink-soft">No runs here.</p>;
  return (
    <div role="region" aria-label={caption} tabIndex={0} className="overflow-x-auto rounded-md border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-sunk">
          <tr>
            {['Unit', 'Instrument', 'Measured', 'State', 'Readings', 'Flags'].map((h) => (
              <th key={h} scope="col" className="bl-label border-b border-rule px-4 py-2">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {runs.map((r) => (
            <tr key={r.id} className="border-b border-rule last:border-b-0 align-top">
              <th scope="row" className="px-4 py-3 font-sans font-semibold">
                <Link to={`/lab/runs/${r.id}`}>
                  {r.unit.makerName} {r.unit.modelName}
                </Link>
                <span className="block text-xs font-normal text-ink-muted">serial {r.unit.serial}</span>
              </th>
              <td className="px-4 py-3">
                {r.instrument.name}
                {r.instrument.calibrationOverdue ? <span className="block font-sans text-xs font-semibold text-danger">calibration overdue</span> : null}
              </td>
              <td className="px-4 py-3">
                {formatDate(r.measuredOn)}
                <span className="block font-sans text-xs text-ink-muted">
                  {r.measuredBy.displayName}
                  {meId && r.measuredBy.id === meId ? ' (you: another editor reviews it)' : ''}
                </span>
              </td>
              <td className="px-4 py-3">
                <RunStatusBadge status={r.status} />
              </td>
              <td className="px-4 py-3 font-sans text-xs tabular-nums">
                {formatCount(r.progress.analysed)} of {formatCount(r.progress.expected)} analysed
                {r.progress.failed ? `, ${formatCount(r.progress.failed)} failed` : ''}
                {r.progress.excluded ? `, ${formatCount(r.progress.excluded)} excluded` : ''}
              </td>
              <td className="px-4 py-3 font-sans text-xs">
                {r.progress.flags ? `${formatCount(r.progress.flags)} ${r.progress.flags === 1 ? 'flag' : 'flags'}` : 'none'}
                {r.progress.analysing ? <span className="block text-ink-muted">updating…</span> : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
