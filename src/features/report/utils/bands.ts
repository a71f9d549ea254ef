import { COMBINED_BAND } from '#shared/lab/band-values.ts';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { formatLength } from '#src/lib/format.ts';

const NAMES: Record<string, string> = { [COMBINED_BAND]: 'Combined', red: 'Red', nir: 'Near-infrared' };

/** The report's bands for the pickers: combined first, then by wavelength. */
export function bandKeys(report: Pick<PublicReport, 'bands'>): string[] {
  return [COMBINED_BAND, ...Object.entries(report.bands).sort(([, a], [, b]) => a.loNm - b.loNm).map(([k]) => k)];
}

/** "Red", "Near-infrared", "Combined": the picker's label. */
export function bandName(key: string): string {
  return NAMES[key] ?? key;
}

/** "red (600–700 nm)", "the combined band (600–1100 nm)": for sentences and captions. */
export function bandPhrase(report: Pick<PublicReport, 'bands'>, key: string): string {
  const ranges = Object.values(report.bands);
  const range =
    key === COMBINED_BAND
      ? ranges.length
        ? { loNm: Math.min(...ranges.map((r) => r.loNm)), hiNm: Math.max(...ranges.map((r) => r.hiNm)) }
        : null
      : (report.bands[key] ?? null);
  const name = key === COMBINED_BAND ? 'the combined band' : bandName(key).toLowerCase();
  return range ? `${name} (${formatLength(range.loNm)}–${formatLength(range.hiNm)} nm)` : name;
}
