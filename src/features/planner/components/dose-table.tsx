import type { SessionPlan } from '#shared/measurement/planner/types.ts';
import { formatFigure, formatLength } from '#src/lib/format.ts';

/** The dose map as numbers: rows by y (top = highest), columns by x, J/cm²; blank outside the zones. */
export function DoseTable({ plan }: { plan: SessionPlan }) {
  const { x0Cm, y0Cm, stepCm, nx, ny, values } = plan.doseMap;
  const columns = [...Array(nx).keys()].filter((i) => [...Array(ny).keys()].some((j) => values[i + j * nx] !== null));
  const rows = [...Array(ny).keys()].reverse().filter((j) => columns.some((i) => values[i + j * nx] !== null));
  return (
    <div role="region" aria-label={`Doses at ${formatLength(plan.distanceCm)} cm`} tabIndex={0} className="overflow-x-auto">
      <table className="border-collapse font-sans text-xs tabular-nums">
        <caption className="pb-2 text-left text-sm font-semibold text-ink">
          Dose at each 2 cm cell, J/cm² (rows: y, columns: x, in cm; “n/m”: outside the measured grid)
        </caption>
        <thead>
          <tr>
            <th scope="col" className="px-2 py-1 text-right text-ink-soft">y \ x</th>
            {columns.map((i) => (
              <th key={i} scope="col" className="border-b border-rule px-2 py-1 text-right">
                {formatLength(x0Cm + i * stepCm)}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((j) => (
            <tr key={j}>
              <th scope="row" className="border-r border-rule px-2 py-1 text-right">
                {formatLength(y0Cm + j * stepCm)}
              </th>
              {columns.map((i) => {
                const v = values[i + j * nx];
                return (
                  <td key={i} className="px-2 py-1 text-right">
                    {v === null ? '' : Number.isNaN(v) ? 'n/m' : formatFigure(v)}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
