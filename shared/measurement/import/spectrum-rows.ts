/**
 * The hot loop of the spectrum importer: reads the wavelength and irradiance cells of every record
 * csv-parse gave (see table-records.ts). Bad rows are counted and reported with their line;
 * nothing is thrown.
 */
import { ImportIssueList } from './import-issue-list.ts';
import { isMissingCell, looksLikeFormula } from './delimited-fields.ts';
import { parseDecimalCell } from './parse-decimal.ts';
import { isEmptyRecord, type TableRecords } from './table-records.ts';

export interface RowLayout {
  wavelengthIndex: number;
  irradianceIndex: number;
  /** Columns named by the header; later non-empty cells are "extra values". */
  headerWidth: number;
  /** Multiplies the wavelength cell to give nm (1 for nm, 1000 for µm, 0.1 for Å). */
  wavelengthScaleToNm: number;
}

export interface RawSamples {
  wavelengthNm: Float64Array;
  irradiance: Float64Array;
  line: Int32Array;
  count: number;
  /** Non-blank, non-comment lines under the header. */
  dataRows: number;
  /** Rows whose two cells are numbers (in range or not). */
  numericRows: number;
  badRows: number;
  outOfRangeRows: number;
  rowsWithExtraValues: number;
  /** Range of the numeric wavelengths, in range or not, for the message when none is in range. */
  minSeenNm: number;
  maxSeenNm: number;
}

export const MIN_WAVELENGTH_NM = 200;
export const MAX_WAVELENGTH_NM = 2500;

/** `lines`: the file's lines, to quote a bad row in its message. */
export function readSpectrumRows(table: TableRecords, lines: readonly string[], layout: RowLayout, issues: ImportIssueList): RawSamples {
  const { records, lines: lineOf } = table;
  const capacity = records.length;
  const wavelengthNm = new Float64Array(capacity);
  const irradiance = new Float64Array(capacity);
  const sampleLine = new Int32Array(capacity);
  const { wavelengthIndex, irradianceIndex, headerWidth, wavelengthScaleToNm } = layout;
  const out: RawSamples = {
    wavelengthNm,
    irradiance,
    line: sampleLine,
    count: 0,
    dataRows: 0,
    numericRows: 0,
    badRows: 0,
    outOfRangeRows: 0,
    rowsWithExtraValues: 0,
    minSeenNm: Infinity,
    maxSeenNm: -Infinity,
  };

  for (let k = 0; k < records.length; k++) {
    const cells = records[k];
    const line = lineOf[k];
    // A comma inside a cell was quoted or is not the delimiter, so it can only be a decimal comma.
    let wl = parseDecimalCell(cells[wavelengthIndex] ?? '', true);
    const e = parseDecimalCell(cells[irradianceIndex] ?? '', true);
    if (Number.isNaN(wl) || Number.isNaN(e)) {
      if (isEmptyRecord(cells)) continue;
      out.dataRows++;
      out.badRows++;
      reportBadRow(cells, lines[line - 1] ?? '', line, layout, issues);
      continue;
    }
    out.dataRows++;
    out.numericRows++;
    for (let c = headerWidth; c < cells.length; c++) {
      if (cells[c].trim() !== '') {
        out.rowsWithExtraValues++;
        break;
      }
    }
    wl *= wavelengthScaleToNm;
    if (wl < out.minSeenNm) out.minSeenNm = wl;
    if (wl > out.maxSeenNm) out.maxSeenNm = wl;
    if (!(wl >= MIN_WAVELENGTH_NM && wl <= MAX_WAVELENGTH_NM)) {
      out.outOfRangeRows++;
      issues.add(
        line,
        'wavelength_out_of_range',
        'warning',
        `Line ${line}: wavelength ${wl} nm is outside ${MIN_WAVELENGTH_NM}–${MAX_WAVELENGTH_NM} nm; the row was left out.`,
      );
      continue;
    }
    wavelengthNm[out.count] = wl;
    irradiance[out.count] = e;
    sampleLine[out.count] = line;
    out.count++;
  }
  return out;
}

function reportBadRow(cells: readonly string[], text: string, line: number, layout: RowLayout, issues: ImportIssueList): void {
  const wlCell = cells[layout.wavelengthIndex] ?? '';
  const eCell = cells[layout.irradianceIndex] ?? '';
  const isText = (cell: string) => cell.trim() !== '' && !isMissingCell(cell) && Number.isNaN(parseDecimalCell(cell, true));
  if (looksLikeFormula(wlCell) || looksLikeFormula(eCell)) {
    issues.add(line, 'formula_cell', 'warning', `Line ${line} holds a spreadsheet formula instead of a number; the row was left out.`);
  } else if (isText(wlCell) || isText(eCell)) {
    const shown = text.length > 40 ? `${text.slice(0, 40)}…` : text;
    issues.add(line, 'non_numeric_row', 'warning', `Line ${line} ("${shown}") does not hold two numbers; the row was left out.`);
  } else if (cells.length <= Math.max(layout.wavelengthIndex, layout.irradianceIndex)) {
    issues.add(line, 'missing_value', 'warning', `Line ${line} is shorter than the header (a value is missing); the row was left out.`);
  } else {
    issues.add(line, 'missing_value', 'warning', `Line ${line} has an empty or NaN value; the row was left out.`);
  }
}
