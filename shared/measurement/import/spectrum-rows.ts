/**
 * The hot loop of the spectrum importer: reads the wavelength and irradiance cells of every data
 * line without building per-cell strings or running regexes (a quoted or space-separated line
 * takes the slower general path). Bad rows are counted and reported; nothing is thrown.
 */
import { ProblemList } from './problem-list.ts';
import { isBlankLine, isMissingCell, looksLikeFormula, splitFields, type Delimiter } from './delimited-fields.ts';
import { parseDecimal, parseDecimalCell } from './parse-decimal.ts';

export interface RowLayout {
  delimiter: Delimiter;
  wavelengthIndex: number;
  irradianceIndex: number;
  /** Columns named by the header; later non-empty cells are "extra values". */
  headerWidth: number;
  decimalComma: boolean;
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

export function readSpectrumRows(lines: readonly string[], from: number, layout: RowLayout, issues: ProblemList): RawSamples {
  const capacity = Math.max(0, lines.length - from);
  const wavelengthNm = new Float64Array(capacity);
  const irradiance = new Float64Array(capacity);
  const lineOf = new Int32Array(capacity);
  const { delimiter, wavelengthIndex, irradianceIndex, headerWidth, decimalComma, wavelengthScaleToNm } = layout;
  const out: RawSamples = {
    wavelengthNm,
    irradiance,
    line: lineOf,
    count: 0,
    dataRows: 0,
    numericRows: 0,
    badRows: 0,
    outOfRangeRows: 0,
    rowsWithExtraValues: 0,
    minSeenNm: Infinity,
    maxSeenNm: -Infinity,
  };

  for (let i = from; i < lines.length; i++) {
    const text = lines[i];
    if (text.length === 0) continue;
    let wl = NaN;
    let e = NaN;
    let fields = 0;
    let extra = false;

    if (delimiter !== ' ' && text.indexOf('"') === -1) {
      let start = 0;
      for (;;) {
        let end = text.indexOf(delimiter, start);
        if (end === -1) end = text.length;
        if (fields === wavelengthIndex) wl = parseDecimal(text, start, end, decimalComma);
        else if (fields === irradianceIndex) e = parseDecimal(text, start, end, decimalComma);
        else if (fields >= headerWidth && !extra) extra = !isBlankSlice(text, start, end);
        fields++;
        if (end === text.length) break;
        start = end + 1;
      }
    } else {
      // A comma left inside a split cell was quoted, so it can only be a decimal comma.
      const cells = splitFields(text, delimiter);
      fields = cells.length;
      wl = parseDecimalCell(cells[wavelengthIndex] ?? '', true);
      e = parseDecimalCell(cells[irradianceIndex] ?? '', true);
      for (let k = headerWidth; k < cells.length && !extra; k++) extra = cells[k] !== '';
    }

    if (Number.isNaN(wl) || Number.isNaN(e)) {
      if (isBlankLine(text) || text.trimStart().charCodeAt(0) === 35 /* # */) continue;
      out.dataRows++;
      out.badRows++;
      reportBadRow(text, i + 1, layout, issues);
      continue;
    }
    out.dataRows++;
    out.numericRows++;
    if (extra) out.rowsWithExtraValues++;
    wl *= wavelengthScaleToNm;
    if (wl < out.minSeenNm) out.minSeenNm = wl;
    if (wl > out.maxSeenNm) out.maxSeenNm = wl;
    if (!(wl >= MIN_WAVELENGTH_NM && wl <= MAX_WAVELENGTH_NM)) {
      out.outOfRangeRows++;
      issues.add(
        i + 1,
        'wavelength_out_of_range',
        'warning',
        `Line ${i + 1}: wavelength ${wl} nm is outside ${MIN_WAVELENGTH_NM}–${MAX_WAVELENGTH_NM} nm; the row was left out.`,
      );
      continue;
    }
    wavelengthNm[out.count] = wl;
    irradiance[out.count] = e;
    lineOf[out.count] = i + 1;
    out.count++;
  }
  return out;
}

function isBlankSlice(text: string, start: number, end: number): boolean {
  for (let k = start; k < end; k++) {
    const c = text.charCodeAt(k);
    if (c !== 32 && c !== 9 && c !== 34) return false;
  }
  return true;
}

function reportBadRow(text: string, line: number, layout: RowLayout, issues: ProblemList): void {
  const cells = splitFields(text, layout.delimiter);
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
