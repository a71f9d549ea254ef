/**
 * Spectrum importer: text export of a spectroradiometer → ascending wavelengths (nm) and spectral
 * irradiance (W·m⁻²·nm⁻¹), the preamble as metadata, and the problems found. Never throws on bad data.
 *
 * Policy for problems on a line. A bad row — not numeric, an empty/NaN cell, a spreadsheet formula, a
 * wavelength outside 200–2500 nm, a repeated wavelength (the later line) — is DROPPED and reported
 * as a warning with its line; the rest of the file is used. The file is REJECTED (an error, ok=false)
 * when: it is empty, not text (binary, UTF-16 read as UTF-8) or not a delimited table (or lays the
 * wavelengths across a row); it has a header but no rows; most of its rows are bad; no wavelength
 * lies in 200–2500 nm (likely µm or Å);
 * fewer than 2 samples remain; no irradiance column can be told apart; or no unit is known
 * (none in the header, the unit line or the preamble, and none given by the caller).
 * At most 20 located problems per code are listed; one closing warning counts the rest.
 *
 * Unit precedence: with the caller's unit and unitPolicy 'override' (the default), the caller's
 * unit; otherwise the irradiance column's header (or the unit line under it), then the preamble
 * (a `Units: …` line, else any line naming a spectral unit), and with unitPolicy 'if-missing' the
 * caller's unit only when the file names none. Disagreements are reported as warnings.
 * Messages are neutral: each caller (command line, page, worker) adds its own hint.
 * Negative irradiance values (noise around zero) are kept: integration is signed.
 *
 * Our code finds the table (preamble, header, delimiter) and reads the cells; csv-parse splits
 * the rows (table-records.ts).
 */
import type { ImportIssue } from './import-issue.ts';
import { ImportIssueList } from './import-issue-list.ts';
import { splitTextLines } from './text-lines.ts';
import { isBlankLine } from './delimited-fields.ts';
import { readTableRecords } from './table-records.ts';
import { parseMetadataLine } from './metadata-line.ts';
import { findWavelengthRow, locateTable, type TableLocation } from './locate-table.ts';
import { chooseIrradianceColumn, wavelengthScaleToNm } from './spectrum-columns.ts';
import { readSpectrumRows, MAX_WAVELENGTH_NM, MIN_WAVELENGTH_NM, type RawSamples } from './spectrum-rows.ts';
import { orderSamples } from './order-samples.ts';
import { parseUnitSpelling, type UnitSpelling } from './unit-spelling.ts';
import { convertToWm2Nm, type SpectralIrradianceUnit } from '../units.ts';

export interface Spectrum {
  /** Ascending, no repeats. */
  wavelengthNm: Float64Array;
  /** Spectral irradiance in W·m⁻²·nm⁻¹, signed. */
  irradianceWm2Nm: Float64Array;
}

export interface SpectrumImport {
  ok: boolean;
  /** Null when the file was rejected. */
  spectrum: Spectrum | null;
  /** Canonical spelling of the unit the values were read in (e.g. `uW/cm2/nm`), or null. */
  unit: string | null;
  /** Where that unit came from: the file itself or the caller's option. */
  unitSource: 'file' | 'caller' | null;
  metadata: Record<string, string>;
  issues: ImportIssue[];
}

/** 'override': the caller's unit wins over the file's; 'if-missing': it applies only when the file names none. */
export type UnitPolicy = 'override' | 'if-missing';

export interface SpectrumImportOptions {
  /** Unit of the irradiance column, in any spelling the importer recognises. */
  unit?: string;
  /** How the caller's unit relates to the file's (default 'override'). */
  unitPolicy?: UnitPolicy;
}

export const KNOWN_UNITS_HINT = 'W/m2/nm, mW/m2/nm, uW/cm2/nm, mW/cm2/nm or W/cm2/nm';

export function importSpectrum(text: string, options: SpectrumImportOptions = {}): SpectrumImport {
  const metadata: Record<string, string> = {};
  const rejected = (issues: ImportIssue[]): SpectrumImport => ({ ok: false, spectrum: null, unit: null, unitSource: null, metadata, issues });

  const split = splitTextLines(text);
  if (split.lines === null) return rejected([split.issue]);
  const lines = split.lines;
  const issues = new ImportIssueList();

  let callerUnit: SpectralIrradianceUnit | null = null;
  if (options.unit !== undefined && options.unit.trim() !== '') {
    const parsed = parseUnitSpelling(options.unit);
    if (parsed?.kind !== 'spectral') {
      issues.add(null, 'unknown_unit', 'error', `The unit "${options.unit}" is not a spectral irradiance unit we know; use ${KNOWN_UNITS_HINT}.`);
      return rejected(issues.finish());
    }
    callerUnit = parsed.unit;
  }

  const table = locateTable(lines);
  const wavelengthRow = table === null ? findWavelengthRow(lines) : null;
  if (wavelengthRow !== null) {
    issues.add(
      wavelengthRow + 1,
      'wavelengths_in_a_row',
      'error',
      `Line ${wavelengthRow + 1} holds the wavelengths across a row. Export (or transpose) the spectrum with wavelength and irradiance as columns, one sample per line.`,
    );
    return rejected(issues.finish());
  }
  if (table === null) {
    issues.add(
      null,
      'not_delimited',
      'error',
      'This does not look like a spectrum export: no table with a wavelength column was found. Export the spectrum as comma-, semicolon- or tab-separated text.',
    );
    return rejected(issues.finish());
  }
  const preambleUnit = readPreamble(lines, table.preambleEnd, metadata);

  let irradianceIndex = 1;
  let columnUnit: UnitSpelling | null = null;
  let columnName = 'second column';
  if (table.header === null) {
    issues.add(
      table.dataStart + 1,
      'no_header',
      'warning',
      'The table has no header line; the first column was read as wavelength (nm) and the second as spectral irradiance.',
    );
  } else {
    const column = chooseIrradianceColumn(table.header, table.unitLine, table.wavelengthIndex);
    if (column === null) {
      issues.add(
        table.headerIndex! + 1,
        'no_irradiance_column',
        'error',
        `No spectral irradiance column could be told apart in the header (${table.header.join(', ')}). Name it, e.g. "Irradiance (W/m2/nm)".`,
      );
      return rejected(issues.finish());
    }
    irradianceIndex = column.index;
    columnUnit = column.unit;
    columnName = `"${column.name}"`;
    if (column.equallyLikely.length > 0) {
      const others = column.equallyLikely.map((name) => `"${name}"`).join(', ');
      issues.add(
        table.headerIndex! + 1,
        'ambiguous_irradiance_column',
        'warning',
        `${others} could also be the spectral irradiance; ${columnName}, the first such column, was used.`,
      );
    }
  }

  const resolved = resolveUnit(callerUnit, options.unitPolicy ?? 'override', columnUnit, preambleUnit, columnName, issues);
  const unit = resolved?.unit ?? null;
  const wavelengthHeader = table.header?.[table.wavelengthIndex] ?? '';
  const records = readTableRecords(split, table.dataStart, table.delimiter);
  const samples = readSpectrumRows(
    records,
    lines,
    {
      wavelengthIndex: table.wavelengthIndex,
      irradianceIndex,
      headerWidth: table.headerWidth,
      wavelengthScaleToNm: wavelengthScaleToNm(wavelengthHeader),
    },
    issues,
  );
  checkRowCounts(samples, table, issues);

  const ordered = orderSamples(samples.wavelengthNm, samples.irradiance, samples.line, samples.count, issues);
  if (!issues.hasErrors() && ordered.wavelengthNm.length < 2) {
    issues.add(
      null,
      'too_few_samples',
      'error',
      `The file holds ${ordered.wavelengthNm.length} usable sample${ordered.wavelengthNm.length === 1 ? '' : 's'}; a spectrum needs at least 2.`,
    );
  }

  const finished = issues.finish();
  if (unit === null || finished.some((i) => i.severity === 'error')) {
    return { ok: false, spectrum: null, unit: unit?.canonical ?? null, unitSource: resolved?.source ?? null, metadata, issues: finished };
  }
  return {
    ok: true,
    spectrum: { wavelengthNm: ordered.wavelengthNm, irradianceWm2Nm: convertToWm2Nm(ordered.values, unit) },
    unit: unit.canonical,
    unitSource: resolved!.source,
    metadata,
    issues: finished,
  };
}

const UNIT_KEY = /unit|einheit|axis|quantity|irradiance|^y$/i;
/** A value that starts with a number is a reading (`Integrated irradiance: 24.1 W/m2`), not a unit. */
const READING = /^[-+]?\.?\d/;

/**
 * Fills `metadata` from the preamble and returns the unit it names: a spectral unit on a
 * `Units: …` line first, else a spectral unit mentioned on any other line (`Data type: Spectral
 * irradiance (W/m2/nm)`, `Spectral irradiance in W/m2/nm`), else the non-spectral unit of a
 * `Units: …` line (reported as such). Readings such as `Integrated irradiance: 24.1 W/m2` name no unit.
 */
function readPreamble(lines: readonly string[], end: number, metadata: Record<string, string>): UnitSpelling | null {
  let keyed: UnitSpelling | null = null;
  let mentioned: UnitSpelling | null = null;
  let notSpectral: UnitSpelling | null = null;
  for (let i = 0; i < end; i++) {
    if (isBlankLine(lines[i])) continue;
    const entry = parseMetadataLine(lines[i]);
    if (entry !== null && !(entry.key in metadata)) metadata[entry.key] = entry.value;
    if (entry !== null && READING.test(entry.value)) continue;
    if (entry !== null && UNIT_KEY.test(entry.key)) {
      const unit = parseUnitSpelling(entry.value);
      if (unit?.kind === 'spectral') keyed ??= unit;
      else notSpectral ??= unit;
    } else {
      const unit = parseUnitSpelling(lines[i]);
      if (unit?.kind === 'spectral') mentioned ??= unit;
    }
  }
  return keyed ?? mentioned ?? notSpectral;
}

function resolveUnit(
  callerUnit: SpectralIrradianceUnit | null,
  policy: UnitPolicy,
  columnUnit: UnitSpelling | null,
  preambleUnit: UnitSpelling | null,
  columnName: string,
  issues: ImportIssueList,
): { unit: SpectralIrradianceUnit; source: 'file' | 'caller' } | null {
  const fileUnit = columnUnit ?? preambleUnit;
  if (columnUnit?.kind === 'spectral' && preambleUnit?.kind === 'spectral' && columnUnit.unit.canonical !== preambleUnit.unit.canonical) {
    issues.add(
      null,
      'unit_conflict',
      'warning',
      `The header gives ${columnUnit.unit.canonical} but the preamble says ${preambleUnit.unit.canonical}; the header's unit was used.`,
    );
  }
  if (callerUnit && (policy === 'override' || fileUnit === null)) {
    const named = fileUnit?.kind === 'spectral' ? fileUnit.unit.canonical : fileUnit?.kind === 'not_spectral' ? fileUnit.spelling : null;
    if (named !== null && named !== callerUnit.canonical) {
      issues.add(null, 'unit_overridden', 'warning', `The file names ${named}; the values were read as ${callerUnit.canonical} as asked.`);
    }
    return { unit: callerUnit, source: 'caller' };
  }
  if (fileUnit === null) {
    issues.add(
      null,
      'no_unit',
      'error',
      `No unit found for the irradiance column ${columnName}. Name it in the header, e.g. "Irradiance (W/m2/nm)", or say which unit the file was saved in (${KNOWN_UNITS_HINT}).`,
    );
    return null;
  }
  if (fileUnit.kind === 'not_spectral') {
    const why = fileUnit.spelling.includes('/sr') ? 'per steradian, i.e. radiance' : 'not per nanometre';
    issues.add(
      null,
      'unit_not_spectral',
      'error',
      `The irradiance column is in ${fileUnit.spelling}, which is ${why}: a spectrum needs spectral irradiance such as ${KNOWN_UNITS_HINT}. If the label is wrong, say which unit the file was saved in.`,
    );
    return null;
  }
  return { unit: fileUnit.unit, source: 'file' };
}

function checkRowCounts(samples: RawSamples, table: TableLocation, issues: ImportIssueList): void {
  if (samples.dataRows === 0) {
    issues.add(null, 'no_data', 'error', 'The file has a header but no data rows under it.');
    return;
  }
  if (samples.badRows > samples.numericRows) {
    issues.add(
      null,
      'too_many_bad_rows',
      'error',
      `${samples.badRows} of ${samples.dataRows} rows could not be read as numbers, so the file was rejected. Check the delimiter and the number format.`,
    );
    return;
  }
  if (table.delimiter === ',' && samples.rowsWithExtraValues * 2 > samples.numericRows) {
    issues.add(
      null,
      'extra_values',
      'error',
      'Most rows have more values than the header has columns: numbers with decimal commas in a comma-separated file cannot be read safely. Export with semicolons or tabs, or with decimal points.',
    );
    return;
  }
  if (samples.numericRows > 0 && samples.count === 0 && samples.outOfRangeRows > 0) {
    const lo = samples.minSeenNm;
    const hi = samples.maxSeenNm;
    issues.remove('wavelength_out_of_range');
    const hint = hi <= 3 ? ' They look like micrometres: label the column "Wavelength (µm)".' : lo >= 2000 ? ' They look like ångström: label the column "Wavelength (Å)".' : '';
    issues.add(
      null,
      'no_wavelengths_in_range',
      'error',
      `No wavelength lies within ${MIN_WAVELENGTH_NM}–${MAX_WAVELENGTH_NM} nm (the file gives ${lo} to ${hi}).${hint}`,
    );
  }
}
