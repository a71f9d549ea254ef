import type { PublicReport } from '#shared/schemas/reports.ts';
import { formatLength as formatPlainLength } from '#src/lib/format.ts';

/** The reader's formatters (useDisplayUnits() has this shape). */
export interface ReaderFormatters {
  length: string;
  lengthValue: (cm: number) => number;
  formatIrradiance: (mwCm2: number | null | undefined) => string;
  formatLength: (cm: number | null | undefined) => string;
  formatArea: (cm2: number | null | undefined) => string;
}

export interface ClaimDisplayRow {
  key: string;
  label: string;
  claimed: string;
  measured: string;
  /** measured ÷ claimed, where the two are of one kind. */
  ratio: number | null;
  note: string | null;
}

const BEAM_LABEL = 'Beam angle (full angle at half intensity)';

/**
 * The claims table in the reader's units. The server's rows carry their numbers as text in cm and
 * mW/cm²; the rows whose numbers are in the report (irradiance, emitting area) are written again
 * from those numbers, the others kept as published. A fitted beam angle is shown even when the
 * maker states none, so the effective angle is always beside the claim.
 */
export function claimsForDisplay(
  report: Pick<PublicReport, 'claims' | 'model' | 'beamAngle'>,
  f: ReaderFormatters,
  /** Area at or above 50 % of the peak at 30 cm (combined band), cm²; null when not measured there. */
  area50At30Cm2: number | null,
): ClaimDisplayRow[] {
  const claims = report.model.claims;
  const rows: ClaimDisplayRow[] = report.claims.map((row) => {
    if (row.key === 'irradiance' && claims.irradianceMwCm2 !== null) {
      const at = claims.atDistanceCm ?? 0;
      const where = at > 0 ? `at ${f.formatLength(at)}` : 'at the surface';
      return {
        ...row,
        claimed: `${f.formatIrradiance(claims.irradianceMwCm2)} ${where}`,
        measured: row.ratio !== null ? `${f.formatIrradiance(row.ratio * claims.irradianceMwCm2)} ${where}` : row.measured,
      };
    }
    if (row.key === 'emittingArea') {
      const { width, height } = report.model.emittingAreaCm;
      return {
        ...row,
        claimed: `${formatPlainLength(f.lengthValue(width))} × ${formatPlainLength(f.lengthValue(height))} ${f.length}`,
        measured: area50At30Cm2 === null ? row.measured : `${f.formatArea(area50At30Cm2)} at or above 50 % of the peak at ${f.formatLength(30)}`,
      };
    }
    return { ...row };
  });
  if (report.beamAngle && !rows.some((r) => r.key === 'beamAngle')) {
    const fitted: ClaimDisplayRow = {
      key: 'beamAngle',
      label: BEAM_LABEL,
      claimed: 'not stated',
      measured: `${formatPlainLength(report.beamAngle.fittedFullAngleDeg)}° effective, fitted from the profiles and the falloff`,
      ratio: null,
      note: null,
    };
    const after = rows.findIndex((r) => r.key === 'irradiance');
    rows.splice(after + 1, 0, fitted);
  }
  return rows;
}
