/**
 * A meter-readings file (the lab's template distance_cm,x_cm,y_cm,irradiance_mw_cm2), checked
 * the one way Benchlight reads it: size limit → decode → import → grid analysis. Values stay in
 * mW/cm², the template's unit. Never throws on bad data.
 */
import { decodeTextBytes, type DecodedText } from '../import/decode-text.ts';
import type { ImportIssue } from '../import/import-issue.ts';
import { importMeterReadings, type MeterReadingsImport } from '../import/meter-readings-import.ts';
import { analyzeGrid, type GridAnalysis, type GridAnalysisOptions } from './analyze-grid.ts';
import { sizeIssue } from './limits.ts';

export interface MeterReadingsFileCheck extends GridAnalysis {
  ok: boolean;
  encoding: DecodedText['encoding'] | null;
  result: MeterReadingsImport | null;
  issues: ImportIssue[];
}

export function checkMeterReadingsFile(bytes: Uint8Array, options: GridAnalysisOptions = {}): MeterReadingsFileCheck {
  const tooLarge = sizeIssue(bytes.byteLength);
  if (tooLarge) {
    return { ok: false, encoding: null, result: null, issues: [tooLarge], planes: [], falloff: { exponent: null, local: [], point: [] } };
  }
  const decoded = decodeTextBytes(bytes);
  const result = importMeterReadings(decoded.text);
  const grid = analyzeGrid(
    result.readings.map((r) => ({ distanceCm: r.distanceCm, xCm: r.xCm, yCm: r.yCm, value: r.irradianceMwCm2 })),
    options,
  );
  return { ok: result.ok && result.readings.length > 0, encoding: decoded.encoding, result, issues: [...decoded.issues, ...result.issues], ...grid };
}
