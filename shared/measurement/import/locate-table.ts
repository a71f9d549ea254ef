/**
 * Finds where the table starts: preamble lines first, then a header naming a wavelength column
 * (optionally followed by a unit line), then numbers. A header-like line is only taken once a
 * numeric row follows it, so a preamble line such as `Wavelength range;350-1050 nm` is not
 * mistaken for the header. A header written as a comment (`# wavelength_nm irradiance_W_m2_nm`,
 * as scripts that save arrays write it) counts when the rows under it have as many columns.
 * A file of bare number pairs (no header) is read as wavelength, value.
 */
import { detectDelimiter, isBlankLine, splitFields, type Delimiter } from './delimited-fields.ts';
import { parseDecimalCell } from './parse-decimal.ts';
import { isUnitLine, isWavelengthName } from './spectrum-columns.ts';

export interface TableLocation {
  /** Index (0-based) of the header line, or null when the file has no header. */
  headerIndex: number | null;
  /** Lines before this index are preamble. */
  preambleEnd: number;
  /** First line the row reader looks at. */
  dataStart: number;
  delimiter: Delimiter;
  header: string[] | null;
  unitLine: string[] | null;
  wavelengthIndex: number;
  headerWidth: number;
}

interface Candidate {
  index: number;
  delimiter: Delimiter;
  cells: string[];
  wavelengthIndex: number;
  unitLineIndex: number | null;
  unitLine: string[] | null;
  /** The header sits behind a comment mark. */
  commented: boolean;
}

function isNumber(cell: string | undefined, delimiter: Delimiter): boolean {
  return cell !== undefined && !Number.isNaN(parseDecimalCell(cell, delimiter !== ','));
}

/** Index of the wavelength column when `text` reads as a header, else -1. */
function looksLikeHeader(text: string, cells: string[], delimiter: Delimiter): number {
  if (cells.length < 2 || cells.some((c) => c.length > 80 || isNumber(c, delimiter))) return -1;
  const index = cells.findIndex(isWavelengthName);
  return index >= 0 && namesAfterKey(text, cells[index]) ? -1 : index;
}

/** `X axis: Wavelength (nm)` or `Abscissa = wavelength`: a preamble entry whose value is the name. */
function namesAfterKey(text: string, cell: string): boolean {
  const at = text.indexOf(cell);
  return at > 0 && /[:=]\s*$/.test(text.slice(0, at));
}

function nextNonBlank(lines: readonly string[], from: number): number {
  for (let j = from; j < lines.length; j++) if (!isBlankLine(lines[j])) return j;
  return -1;
}

function fromCandidate(c: Candidate): TableLocation {
  return {
    headerIndex: c.index,
    preambleEnd: c.index,
    dataStart: (c.unitLineIndex ?? c.index) + 1,
    delimiter: c.delimiter,
    header: c.cells,
    unitLine: c.unitLine,
    wavelengthIndex: c.wavelengthIndex,
    headerWidth: c.cells.length,
  };
}

const COMMENT_MARK = /^\s*#+\s*/;

export function locateTable(lines: readonly string[]): TableLocation | null {
  let candidate = null as Candidate | null;
  for (let i = 0; i < lines.length; i++) {
    const commented = COMMENT_MARK.test(lines[i]);
    const text = commented ? lines[i].replace(COMMENT_MARK, '') : lines[i];
    if (isBlankLine(text) || i === candidate?.unitLineIndex) continue;
    // A comment under a real header is a note, never a better header.
    if (commented && candidate && !candidate.commented) continue;
    if (candidate && !commented) {
      const row = splitFields(text, candidate.delimiter);
      if (isNumber(row[candidate.wavelengthIndex], candidate.delimiter)) {
        if (!candidate.commented || row.length === candidate.cells.length) return fromCandidate(candidate);
        candidate = null;
      }
    }
    const delimiter = detectDelimiter(text);
    if (delimiter === null) continue;
    const cells = splitFields(text, delimiter);
    const wavelengthIndex = looksLikeHeader(text, cells, delimiter);
    if (wavelengthIndex >= 0) {
      const j = commented ? -1 : nextNonBlank(lines, i + 1);
      const below = j >= 0 ? splitFields(lines[j], delimiter) : null;
      const unitLine = below && isUnitLine(below, wavelengthIndex) ? below : null;
      candidate = { index: i, delimiter, cells, wavelengthIndex, unitLineIndex: unitLine ? j : null, unitLine, commented };
      continue;
    }
    if (commented) continue;
    const filled = cells.filter((c) => c !== '');
    if (!candidate && filled.length >= 2 && filled.every((c) => isNumber(c, delimiter))) {
      return {
        headerIndex: null,
        preambleEnd: i,
        dataStart: i,
        delimiter,
        header: null,
        unitLine: null,
        wavelengthIndex: 0,
        headerWidth: cells.length,
      };
    }
  }
  return candidate && !candidate.commented ? fromCandidate(candidate) : null;
}

/**
 * Line index of a row that starts with a wavelength name and goes on with numbers
 * (`Wavelength (nm);400;401;…`): a spectrum laid out across rows instead of down columns.
 */
export function findWavelengthRow(lines: readonly string[]): number | null {
  for (let i = 0; i < lines.length; i++) {
    const delimiter = detectDelimiter(lines[i]);
    if (delimiter === null) continue;
    const cells = splitFields(lines[i], delimiter);
    if (cells.length >= 3 && isWavelengthName(cells[0]) && cells.slice(1, 3).every((c) => isNumber(c, delimiter))) return i;
  }
  return null;
}
