import { mergeRepeatedPoints } from '#shared/measurement/plane/plane-points.ts';
import type { GridPlane } from '#shared/measurement/check/analyze-grid.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatFigure, formatLength } from '#src/lib/format.ts';
import { ScrollRegion } from './scroll-region.tsx';

/** A plane's readings laid out as on the bench (rows by y, highest first; columns by x), in the reader's units. */
export function ReadingsTable({ plane, title }: { plane: GridPlane; title: string }) {
  const units = useDisplayUnits();
  const merged = mergeRepeatedPoints(plane.points);
  const xs = [...new Set(merged.map((p) => p.xCm))].sort((a, b) => a - b);
  const ys = [...new Set(merged.map((p) => p.yCm))].sort((a, b) => b - a);
  const at = new Map(merged.map((p) => [`${p.xCm}|${p.yCm}`, p.value]));
  const len = (cm: number) => formatLength(units.lengthValue(cm));
  return (
    <details className="font-sans text-sm">
      <summary className="cursor-pointer font-semibold text-signal">The readings as a table</summary>
      <ScrollRegion label={`${title}, scrollable`} className="mt-2">
        <table className="border-collapse text-xs tabular-nums">
          <caption className="pb-2 text-left text-sm font-semibold text-ink">
            {title}, {units.irradiance} (rows: y, columns: x, in {units.length})
          </caption>
          <thead>
            <tr>
              <th scope="col" className="px-2 py-1 text-right text-ink-soft">y \ x</th>
              {xs.map((x) => (
                <th key={x} scope="col" className="border-b border-rule px-2 py-1 text-right">
                  {len(x)}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {ys.map((y) => (
              <tr key={y}>
                <th scope="row" className="border-r border-rule px-2 py-1 text-right">
                  {len(y)}
                </th>
                {xs.map((x) => {
                  const v = at.get(`${x}|${y}`);
                  return (
                    <td key={x} className="px-2 py-1 text-right">
                      {v === undefined ? '—' : formatFigure(units.irradianceValue(v))}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
    </details>
  );
}
