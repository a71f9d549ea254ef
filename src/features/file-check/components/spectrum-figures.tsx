import type { ReactNode } from 'react';
import type { BandIrradiance } from '#shared/measurement/spectral/band-irradiance.ts';
import type { SpectrumSummary } from '#shared/measurement/spectral/spectrum-summary.ts';
import type { SpectrumFileCheck } from '#shared/measurement/check/check-spectrum-file.ts';
import { formatCount, formatFigure, formatLength, formatPercent, prettyUnit, wm2ToMwCm2 } from '#src/lib/format.ts';
import { Irradiance } from '#src/components/figures/irradiance.tsx';

const BAND_LABELS: Record<string, string> = { red: 'Red', nir: 'Near-infrared' };

const ENCODING_LABELS: Record<NonNullable<SpectrumFileCheck['encoding']>, string> = {
  'utf-8': 'UTF-8',
  'utf-16le': 'UTF-16 (little-endian)',
  'utf-16be': 'UTF-16 (big-endian)',
  'windows-1252': 'Windows-1252',
};

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <tr className="border-b border-rule last:border-b-0 align-top">
      <th scope="row" className="w-56 py-2 pr-4 text-left font-sans text-sm font-semibold text-ink-soft">
        {label}
      </th>
      <td className="py-2 text-sm">{children}</td>
    </tr>
  );
}

/** Why a band figure may read low: the file stops inside the band. */
function partialNote(band: BandIrradiance, [lo, hi]: [number, number]): string {
  const from = Math.max(band.loNm, lo);
  const to = Math.min(band.hiNm, hi);
  return (
    `The file covers ${formatLength(lo)}–${formatLength(hi)} nm, so only ` +
    `${formatLength(from)}–${formatLength(to)} nm of it was integrated. Light outside the file's range is missing, so the true figure may be higher.`
  );
}

export function UnitLine({ check }: { check: SpectrumFileCheck }) {
  const unit = check.result?.unit;
  if (!unit) return <span className="font-semibold text-danger">not found</span>;
  return (
    <>
      <span className="font-semibold">{prettyUnit(unit)}</span>{' '}
      <span className="font-sans text-xs text-ink-muted">
        {check.result?.unitSource === 'caller' ? '(chosen on this page: the file names no unit)' : '(as the file states)'}
      </span>
    </>
  );
}

/** The figures of one readable spectrum, as a two-column table. */
export function SpectrumFigures({
  check,
  summary,
  captionId,
  fileName,
}: {
  check: SpectrumFileCheck;
  summary: SpectrumSummary;
  captionId: string;
  fileName: string;
}) {
  const range = `${formatLength(summary.rangeNm[0])}–${formatLength(summary.rangeNm[1])} nm`;
  return (
    <table className="w-full border-collapse">
      <caption id={captionId} className="sr-only">
        Figures for {fileName}
      </caption>
      <tbody>
        <Row label="Unit in the file">
          <UnitLine check={check} />
        </Row>
        <Row label="Text encoding">{check.encoding ? ENCODING_LABELS[check.encoding] : '—'}</Row>
        <Row label="Samples">{formatCount(summary.samples)}</Row>
        <Row label="Wavelength range">{range}</Row>
        {Object.entries(summary.bands).map(([name, band]) => (
          <Row key={name} label={`${BAND_LABELS[name] ?? name} (${formatLength(band.loNm)}–${formatLength(band.hiNm)} nm)`}>
            {band.wm2 === null ? (
              <span className="font-semibold text-ink-muted">not measured</span>
            ) : (
              <Irradiance mwCm2={wm2ToMwCm2(band.wm2)} />
            )}
            {summary.bandShares[name] !== null ? (
              <span className="ml-2 font-sans text-xs text-ink-soft">{formatPercent(summary.bandShares[name]!)} of the total</span>
            ) : null}
            {band.wm2 === null ? (
              <p className="mt-1 font-sans text-xs text-warn">
                The file covers {formatLength(summary.rangeNm[0])}–{formatLength(summary.rangeNm[1])} nm and does not
                reach this band at all: nothing of it was measured, which is not the same as no emission there.
              </p>
            ) : band.partial ? (
              <p className="mt-1 font-sans text-xs text-warn">
                <span className="font-semibold">Partial band. </span>
                {partialNote(band, summary.rangeNm)}
              </p>
            ) : null}
          </Row>
        ))}
        <Row label={`Total over ${range}`}>
          <Irradiance mwCm2={wm2ToMwCm2(summary.totalWm2)} />
        </Row>
        <Row label="Peak wavelength">{summary.peakNm === null ? '—' : `${formatLength(summary.peakNm)} nm`}</Row>
        <Row label="Photon flux">
          <span className="font-semibold">{formatFigure(summary.photonFluxUmolM2S)} µmol·m⁻²·s⁻¹</span>{' '}
          <span className="font-sans text-xs text-ink-muted">(over {range})</span>
        </Row>
      </tbody>
    </table>
  );
}

/** The emission peaks the summary found, with their widths where both half-maximum points lie in range. */
export function EmissionPeaksTable({ summary, fileName }: { summary: SpectrumSummary; fileName: string }) {
  if (summary.peaks.length === 0) {
    return <p className="font-sans text-sm text-ink-soft">No emission peak stands out from this spectrum.</p>;
  }
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Emission peaks in {fileName}</caption>
        <thead>
          <tr className="border-b border-rule">
            <th scope="col" className="bl-label py-1.5 pr-4">Peak</th>
            <th scope="col" className="bl-label py-1.5 pr-4">Height</th>
            <th scope="col" className="bl-label py-1.5 pr-4">FWHM</th>
            <th scope="col" className="bl-label py-1.5 pr-4">Half-maximum points</th>
            <th scope="col" className="bl-label py-1.5">Centroid (whole line)</th>
          </tr>
        </thead>
        <tbody>
          {summary.peaks.map((p) => (
            <tr key={p.peakNm} className="border-b border-rule last:border-b-0 text-sm">
              <th scope="row" className="py-1.5 pr-4 text-left font-semibold">{formatLength(p.peakNm)} nm</th>
              <td className="py-1.5 pr-4">{formatFigure(wm2ToMwCm2(p.peakWm2Nm))} mW/cm²/nm</td>
              <td className="py-1.5 pr-4">
                {p.fwhmNm === null ? <span className="text-ink-muted">cut off by the range</span> : `${formatLength(p.fwhmNm)} nm`}
              </td>
              <td className="py-1.5 pr-4">
                {p.halfMaxLoNm === null || p.halfMaxHiNm === null
                  ? '—'
                  : `${formatLength(p.halfMaxLoNm)}–${formatLength(p.halfMaxHiNm)} nm`}
              </td>
              <td className="py-1.5">
                {p.centroidNm === null ? (
                  '—'
                ) : (
                  <>
                    {formatLength(p.centroidNm)} nm{' '}
                    <span className="font-sans text-xs text-ink-muted">
                      (over {formatLength(p.centroidFromNm)}–{formatLength(p.centroidToNm)} nm)
                    </span>
                  </>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
