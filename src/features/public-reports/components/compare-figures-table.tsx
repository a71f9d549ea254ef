import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { GridAnalysis } from '#shared/measurement/check/analyze-grid.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatDate, formatFigure } from '#src/lib/format.ts';
import { categoryLabel } from '../utils/category.ts';
import { COMPARED_BAND, planeAt } from '../utils/compare-planes.ts';
import { KEY_FIGURES } from '../utils/key-figures.ts';
import { seriesStyle } from '../utils/series-style.ts';
import { EmptyFigure } from './empty-figure.tsx';

export interface ComparedReport {
  report: PublicReport;
  grid: GridAnalysis;
}

const rowHead = 'border-b border-rule px-3 py-2 text-left align-top font-sans text-sm font-semibold text-ink-soft';
const cell = 'border-b border-rule px-3 py-2 text-right align-top font-sans text-sm tabular-nums';

/** One figure across the reports: `values` come in the order of the columns, keyed by report. */
function Row({ label, values }: { label: string; values: { key: string; node: ReactNode }[] }) {
  return (
    <tr>
      <th scope="row" className={rowHead}>
        {label}
      </th>
      {values.map((v) => (
        <td key={v.key} className={cell}>
          {v.node}
        </td>
      ))}
    </tr>
  );
}

/** The compared reports' figures in one table: one column per report, one row per figure, the reader's units. */
export function CompareFiguresTable({ compared, distanceCm }: { compared: readonly ComparedReport[]; distanceCm: number }) {
  const units = useDisplayUnits();
  const plane = (c: ComparedReport) => c.report.planes.find((p) => Math.abs(p.distanceCm - distanceCm) < 1e-6)?.bands[COMPARED_BAND] ?? null;
  const at = units.formatLength(distanceCm);
  const each = (f: (c: ComparedReport) => ReactNode) => compared.map((c) => ({ key: c.report.slug, node: f(c) }));
  return (
    <div role="region" aria-labelledby="compare-figures-caption" tabIndex={0} className="relative overflow-x-auto rounded-md border border-rule bg-paper-raised">
      <table className="w-full border-collapse">
        <caption id="compare-figures-caption" className="px-3 pt-3 pb-2 text-left">
          <span className="block text-lg font-semibold">Key figures side by side</span>
          <span className="block font-sans text-xs font-normal text-ink-soft">
            Red and near-infrared together, first unit of each report; an empty cell says why it is empty.
          </span>
        </caption>
        <thead className="bg-paper-sunk">
          <tr>
            <th scope="col" className="border-y border-rule px-3 py-2 text-left align-bottom">
              <span className="bl-label">Figure</span>
            </th>
            {compared.map((c, i) => (
              <th key={c.report.slug} scope="col" className="min-w-40 border-y border-rule px-3 py-2 text-right align-bottom font-sans text-sm">
                <span aria-hidden="true" style={{ color: seriesStyle(i).color }}>
                  {seriesStyle(i).marker}{' '}
                </span>
                <Link to={`/reports/${c.report.slug}`}>{c.report.title}</Link>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          <Row label="Maker and model" values={each((c) => `${c.report.model.makerName} ${c.report.model.name}`)} />
          <Row label="Category" values={each((c) => categoryLabel(c.report.category))} />
          <Row label="Units measured" values={each((c) => String(c.report.units.length))} />
          <Row
            label="Report date"
            values={each((c) => (
              <>
                <time dateTime={c.report.publishedAt}>{formatDate(c.report.publishedAt)}</time>
                {c.report.version > 1 ? ` (version ${c.report.version})` : ''}
              </>
            ))}
          />
          {KEY_FIGURES.map((f) => (
            <Row key={f.id} label={f.heading(units)} values={each((c) => f.text(c.report.keyFigures, units) ?? <EmptyFigure meaning={f.empty} />)} />
          ))}
          <Row
            label={`Peak at ${at} (${units.irradiance})`}
            values={each((c) => {
              const v = plane(c)?.peakMwCm2 ?? null;
              return v === null ? <EmptyFigure meaning="not measured" /> : formatFigure(units.irradianceValue(v));
            })}
          />
          <Row
            label={`50 % spread at ${at} (${units.length})`}
            values={each((c) => {
              const v = plane(c)?.spreadWidthCm['50'] ?? null;
              return v === null || v === undefined ? <EmptyFigure meaning="not measured" /> : formatFigure(units.lengthValue(v));
            })}
          />
          <Row
            label={`Area at ≥ 50 % of the peak at ${at}`}
            values={each((c) => {
              const p = planeAt(c.grid, distanceCm);
              const iso = p?.coverage.isolines.find((i) => i.levelPct === 50);
              return iso ? units.formatArea(iso.areaCm2) : <EmptyFigure meaning="not measured" />;
            })}
          />
          <Row
            label="Falloff exponent (2 = inverse square)"
            values={each((c) => {
              const v = c.report.falloffExponent[COMPARED_BAND] ?? null;
              return v === null ? <EmptyFigure meaning="not measured" /> : formatFigure(v);
            })}
          />
        </tbody>
      </table>
    </div>
  );
}
