import { lazy, Suspense, useMemo } from 'react';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { Spinner } from '#src/components/spinner.tsx';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatLength } from '#src/lib/format.ts';
import { ReportSection } from './report-section.tsx';
import { caption, thNum, th, tdNum, thRow } from './table-styles.ts';

// Chart code (recharts) loads only when a report page draws it.
const SpectrumChart = lazy(() => import('#src/components/figures/spectrum-chart.tsx').then((m) => ({ default: m.SpectrumChart })));

const nm = (v: number | null) => (v === null ? '—' : `${formatLength(v)} nm`);

/** The centre spectrum at the nearest distance, bands shaded and peaks labelled, with the peaks as a table. */
export function SpectrumSection({ report }: { report: PublicReport }) {
  const units = useDisplayUnits();
  const s = report.spectrum;
  const spectrum = useMemo(
    () => (s ? { wavelengthNm: Float64Array.from(s.wavelengthNm), irradianceWm2Nm: Float64Array.from(s.irradianceWm2Nm) } : null),
    [s],
  );
  if (!s || !spectrum) {
    return (
      <ReportSection id="spectrum" title="The spectrum">
        <p className="font-sans text-sm text-ink-soft">This unit was measured with an irradiance meter, which records no spectrum.</p>
      </ReportSection>
    );
  }
  const where = `the centre (x ${units.formatLength(s.xCm)}, y ${units.formatLength(s.yCm)}) at ${units.formatLength(s.distanceCm)}`;
  return (
    <ReportSection id="spectrum" title="The spectrum" lede={`Spectral irradiance at ${where}, first unit.`}>
      <Suspense fallback={<Spinner label="Drawing the spectrum…" />}>
        <SpectrumChart spectrum={spectrum} fileName={where} peaks={s.peaks} units={units} />
      </Suspense>
      {s.peaks.length > 0 ? (
        <table className="border-collapse">
          <caption className={caption}>Emission peaks</caption>
          <thead>
            <tr>
              <th scope="col" className={th}>Peak</th>
              <th scope="col" className={thNum}>Full width at half maximum</th>
              <th scope="col" className={thNum}>Centroid</th>
            </tr>
          </thead>
          <tbody>
            {s.peaks.map((p) => (
              <tr key={p.peakNm}>
                <th scope="row" className={thRow}>{nm(p.peakNm)}</th>
                <td className={tdNum}>{nm(p.fwhmNm)}</td>
                <td className={tdNum}>{nm(p.centroidNm)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </ReportSection>
  );
}
