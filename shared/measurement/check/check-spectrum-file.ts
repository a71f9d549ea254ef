/**
 * One spectrum file, checked the one way Benchlight reads it (bench CLI, File check page, upload
 * worker): size limit → decode the bytes → import → summarise. Never throws on bad data.
 */
import { decodeTextBytes, type DecodedText } from '../import/decode-text.ts';
import type { ImportIssue } from '../import/import-issue.ts';
import { importSpectrum, type SpectrumImport, type UnitPolicy } from '../import/spectrum-import.ts';
import { DEFAULT_BANDS } from '../spectral/band-list.ts';
import type { WavelengthBand } from '../spectral/spectrum.ts';
import { summarizeSpectrum, type SpectrumSummary } from '../spectral/spectrum-summary.ts';
import { sizeIssue } from './limits.ts';

export interface SpectrumFileCheckOptions {
  /** A unit for the irradiance column, any spelling the importer knows. */
  unit?: string;
  /** Whether `unit` overrides the file's own or only fills in a missing one (default 'override'). */
  unitPolicy?: UnitPolicy;
  /** Bands to integrate (default red 600–700, near-infrared 700–1100 nm). */
  bands?: Readonly<Record<string, WavelengthBand>>;
}

export interface SpectrumFileCheck {
  ok: boolean;
  /** Null when the file was not read (over the size limit). */
  encoding: DecodedText['encoding'] | null;
  /** The importer's result; null when the file was not read. */
  result: SpectrumImport | null;
  /** Decoding issues first, then the importer's, then the analysis's (e.g. `band_not_measured`). */
  issues: ImportIssue[];
  summary: SpectrumSummary | null;
}

export function checkSpectrumFile(bytes: Uint8Array, options: SpectrumFileCheckOptions = {}): SpectrumFileCheck {
  const tooLarge = sizeIssue(bytes.byteLength);
  if (tooLarge) return { ok: false, encoding: null, result: null, issues: [tooLarge], summary: null };
  const decoded = decodeTextBytes(bytes);
  const result = importSpectrum(decoded.text, { unit: options.unit, unitPolicy: options.unitPolicy });
  const summary = result.ok && result.spectrum ? summarizeSpectrum(result.spectrum, options.bands ?? DEFAULT_BANDS) : null;
  return {
    ok: summary !== null,
    encoding: decoded.encoding,
    result,
    issues: [...decoded.issues, ...result.issues, ...(summary?.issues ?? [])],
    summary,
  };
}
