/**
 * One spectrum file, checked as the upload would: decode the bytes, import, summarise.
 * Pure (no DOM), so it is tested without rendering.
 */
import { decodeTextBytes, type DecodedText } from '#shared/measurement/import/decode-text.ts';
import type { ImportIssue } from '#shared/measurement/import/import-issue.ts';
import { importSpectrum, type SpectrumImport } from '#shared/measurement/import/spectrum-import.ts';
import { DEFAULT_BANDS } from '#shared/measurement/spectral/band-list.ts';
import { summariseSpectrum, type SpectrumSummary } from '#shared/measurement/spectral/spectrum-summary.ts';

/** The five spectral units the importer knows, in its canonical spelling. */
export const SPECTRAL_UNITS = ['W/m2/nm', 'mW/m2/nm', 'uW/cm2/nm', 'mW/cm2/nm', 'W/cm2/nm'] as const;

export interface SpectrumCheck {
  encoding: DecodedText['encoding'];
  result: SpectrumImport;
  /** Where the unit came from: the file, or the unit chosen on the page for a file naming none. */
  unitSource: 'file' | 'chosen' | null;
  /** Decoding issues first, then the importer's. */
  issues: ImportIssue[];
  summary: SpectrumSummary | null;
}

export function decodeFileBytes(bytes: Uint8Array): DecodedText {
  return decodeTextBytes(bytes);
}

/**
 * The chosen unit applies only when the file names none: the importer lets a caller's unit
 * override the file, which is right for the bench CLI but not for a check of what the file says.
 */
export function checkSpectrum(decoded: DecodedText, unitIfMissing: string): SpectrumCheck {
  let result = importSpectrum(decoded.text);
  let unitSource: SpectrumCheck['unitSource'] = result.unit ? 'file' : null;
  if (unitIfMissing && result.issues.some((i) => i.code === 'no_unit')) {
    result = importSpectrum(decoded.text, { unit: unitIfMissing });
    unitSource = result.unit ? 'chosen' : null;
  }
  const summary = result.ok && result.spectrum ? summariseSpectrum(result.spectrum, DEFAULT_BANDS) : null;
  return { encoding: decoded.encoding, result, unitSource, issues: [...decoded.issues, ...result.issues], summary };
}
