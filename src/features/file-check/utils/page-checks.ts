/**
 * The File check page's two checks: the shared pipeline (shared/measurement/check), with the
 * page's own policy. A unit chosen on the page applies only when the file names none: this page
 * shows what the file says, while the bench CLI's --unit overrides the file.
 */
import { checkMeterReadingsFile, type MeterReadingsFileCheck } from '#shared/measurement/check/check-meter-readings-file.ts';
import { checkSpectrumFile, type SpectrumFileCheck } from '#shared/measurement/check/check-spectrum-file.ts';
import type { FootprintCm } from '#shared/measurement/plane/uniformity.ts';

/** The five spectral units the importer knows, in its canonical spelling. */
export const SPECTRAL_UNITS = ['W/m2/nm', 'mW/m2/nm', 'uW/cm2/nm', 'mW/cm2/nm', 'W/cm2/nm'] as const;

export function checkSpectrumOnPage(bytes: Uint8Array, unitIfMissing: string): SpectrumFileCheck {
  return checkSpectrumFile(bytes, { unit: unitIfMissing || undefined, unitPolicy: 'if-missing' });
}

export function checkMeterReadingsOnPage(bytes: Uint8Array, footprint: FootprintCm | null): MeterReadingsFileCheck {
  return checkMeterReadingsFile(bytes, { footprint });
}
