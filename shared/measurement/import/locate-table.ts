/**
 * Finds where the table starts: preamble lines first, then a header naming a wavelength column
 * (optionally followed by a unit line), then numbers. A header-like line is only taken once a
 * numeric row follows it, so a preamble line such as `Wavelength range;350-1050 nm` is not
 * mistaken for the header. A file of bare number pairs (no header) is read as wavelength, value.
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
}

function isNumber(cell: string | undefined, delimiter: Delimiter): boolean {
  return cell !== undefined && !Number.isNaN(parseDecimalCell(cell, delimiter !== ','));
}

function looksLikeHeader(cells: string[], delimiter: Delimiter): number {
  if (cells.length < 2 || cells.some((c) => c.length > 80 || isNumber(c, delimiter))) return -1;
  return cells.findIndex(isWavelengthName);
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

export function locateTable(lines: readonly string[]): TableLocation | null {
  let candidate = null as Candidate | null;
  for (let i = 0; i < lines.length; i++) {
    const text = lines[i];
    if (isBlankLine(text) || i === candidate?.unitLineIndex) continue;
    if (text.trimStart().startsWith('#')) continue;
    if (candidate && isNumber(splitFields(text, candidate.delimiter)[candidate.wavelengthIndex], candidate.delimiter)) {
      return fromCandidate(candidate);
    }
    const delimiter = detectDelimiter(text);
    if (delimiter === null) continue;
    const cells = splitFields(text, delimiter);
    const wavelengthIndex = looksLikeHeader(cells, delimiter);
    if (wavelengthIndex >= 0) {
      const j = nextNonBlank(lines, i + 1);
      const below = j >= 0 ? splitFields(lines[j], delimiter) : null;
      const unitLine = below && isUnitLine(below, wavelengthIndex) ? below : null;
      candidate = { index: i, delimiter, cells, wavelengthIndex, unitLineIndex: unitLine ? j : null, unitLine };
      continue;
    }
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
  return candidate ? fromCandidate(candidate) : null;
}
