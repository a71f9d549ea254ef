/**
 * Importer for irradiance-meter readings taken with our own template:
 *   distance_cm,x_cm,y_cm,irradiance_mw_cm2
 * Semicolon or tab delimiters, decimal commas (with those delimiters), a UTF-8 BOM, CRLF, blank
 * lines, preamble lines before the header and any column order are accepted.
 *
 * Policy for problems on a line (same as the spectrum importer): a bad row (non-numeric, missing value,
 * negative distance, repeated grid point) is dropped and reported as a warning with its line;
 * the file is rejected (error) when it has no usable row, when most of its rows are bad, or when
 * a column is missing. Never throws on bad data.
 * Our code finds the header and reads the cells; csv-parse splits the rows (table-records.ts).
 */
import { issue, type ImportIssue } from './import-issue.ts';
import { ImportIssueList } from './import-issue-list.ts';
import { splitTextLines } from './text-lines.ts';
import {
  detectDelimiter,
  isBlankLine,
  isMissingCell,
  looksLikeFormula,
  splitFields,
  type Delimiter,
} from './delimited-fields.ts';
import { parseDecimalCell } from './parse-decimal.ts';
import { isEmptyRecord, readTableRecords } from './table-records.ts';

export interface MeterReading {
  distanceCm: number;
  xCm: number;
  yCm: number;
  irradianceMwCm2: number;
  line: number;
}

export interface MeterReadingsImport {
  ok: boolean;
  readings: MeterReading[];
  issues: ImportIssue[];
}

type Column = 'distance_cm' | 'x_cm' | 'y_cm' | 'irradiance_mw_cm2';
const COLUMNS: readonly Column[] = ['distance_cm', 'x_cm', 'y_cm', 'irradiance_mw_cm2'];

/** `Distance (cm)`, `"x_cm"`, `Irradiance (mW/cm²)`, `Irradiance [mW/cm^2]`, `irradiance (mW cm-2)` → template names. */
function normalizeHeaderName(cell: string): string {
  return cell
    .toLowerCase()
    .replace(/²/g, '2')
    .replace(/\^|\*\*/g, '')
    .replace(/cm[-\u207b\u2212]2/g, 'cm2')
    .replace(/[^a-z0-9]+/g, '_')
    .replace(/^_+|_+$/g, '');
}

interface Header {
  lineIndex: number;
  delimiter: Delimiter;
  columnIndex: Map<Column, number>;
}

function findHeader(lines: string[]): Header | null {
  for (let i = 0; i < lines.length; i++) {
    if (isBlankLine(lines[i])) continue;
    const delimiter = detectDelimiter(lines[i]);
    if (delimiter === null) continue;
    const names = splitFields(lines[i], delimiter).map(normalizeHeaderName);
    const columnIndex = new Map<Column, number>();
    names.forEach((name, index) => {
      const column = COLUMNS.find((c) => c === name);
      if (column && !columnIndex.has(column)) columnIndex.set(column, index);
    });
    if (columnIndex.size >= 2) return { lineIndex: i, delimiter, columnIndex };
  }
  return null;
}

function rejected(issues: ImportIssue[]): MeterReadingsImport {
  return { ok: false, readings: [], issues };
}

export function importMeterReadings(text: string): MeterReadingsImport {
  const split = splitTextLines(text);
  if (split.lines === null) return rejected([split.issue]);
  const lines = split.lines;

  const header = findHeader(lines);
  if (header === null) {
    return rejected([
      issue(
        null,
        'no_header',
        'error',
        'No header line was found. The first table line must name the columns distance_cm, x_cm, y_cm and irradiance_mw_cm2.',
      ),
    ]);
  }
  const headerLine = header.lineIndex + 1;
  const missing = COLUMNS.filter((c) => !header.columnIndex.has(c));
  if (missing.length > 0) {
    return rejected([
      issue(
        headerLine,
        'missing_column',
        'error',
        `The header on line ${headerLine} has no ${missing.join(', ')} column. Use the template header distance_cm,x_cm,y_cm,irradiance_mw_cm2.`,
      ),
    ]);
  }

  const issues = new ImportIssueList();
  const readings: MeterReading[] = [];
  const seenPoints = new Map<string, number>();
  let dataRows = 0;
  let badRows = 0;

  const table = readTableRecords(split, header.lineIndex + 1, header.delimiter);
  for (let k = 0; k < table.records.length; k++) {
    const cells = table.records[k];
    if (isEmptyRecord(cells)) continue;
    const line = table.lines[k];
    dataRows++;
    const values: number[] = [];
    let problem: 'missing_value' | 'formula_cell' | 'non_numeric_row' | null = null;
    let problemColumn: Column = 'distance_cm';
    for (const column of COLUMNS) {
      const cell = cells[header.columnIndex.get(column)!] ?? '';
      // A comma inside a cell was quoted or is not the delimiter, so it can only be a decimal comma.
      const value = parseDecimalCell(cell, true);
      if (Number.isNaN(value)) {
        problem = isMissingCell(cell) ? 'missing_value' : looksLikeFormula(cell) ? 'formula_cell' : 'non_numeric_row';
        problemColumn = column;
        break;
      }
      values.push(value);
    }
    if (problem !== null) {
      badRows++;
      issues.add(line, problem, 'warning', rowProblemMessage(problem, line, problemColumn));
      continue;
    }
    const [distanceCm, xCm, yCm, irradianceMwCm2] = values;
    if (distanceCm < 0) {
      badRows++;
      issues.add(line, 'negative_distance', 'warning', `Line ${line} has a negative distance (${distanceCm} cm); the row was left out.`);
      continue;
    }
    const key = `${distanceCm}|${xCm}|${yCm}`;
    const firstLine = seenPoints.get(key);
    if (firstLine !== undefined) {
      badRows++;
      issues.add(
        line,
        'duplicate_point',
        'warning',
        `Line ${line} repeats the point at ${distanceCm} cm, x ${xCm} cm, y ${yCm} cm already read on line ${firstLine}; the repeat was left out.`,
      );
      continue;
    }
    seenPoints.set(key, line);
    if (irradianceMwCm2 < 0) {
      issues.add(line, 'negative_irradiance', 'warning', `Line ${line} has a negative irradiance (${irradianceMwCm2} mW/cm²); it was kept as measured (meter offset?).`);
    }
    readings.push({ distanceCm, xCm, yCm, irradianceMwCm2, line });
  }

  if (dataRows === 0) {
    issues.add(null, 'no_data', 'error', 'The file has a header but no readings under it.');
  } else if (readings.length === 0 || badRows > readings.length) {
    issues.add(
      null,
      'too_many_bad_rows',
      'error',
      `${badRows} of ${dataRows} rows could not be used, so the file was rejected. Check the delimiter and the number format.`,
    );
  }
  const finished = issues.finish();
  const ok = !finished.some((i) => i.severity === 'error');
  return { ok, readings: ok ? readings : [], issues: finished };
}

function rowProblemMessage(problem: 'missing_value' | 'formula_cell' | 'non_numeric_row', line: number, column: Column): string {
  if (problem === 'missing_value') return `Line ${line} has no value for ${column}; the row was left out.`;
  if (problem === 'formula_cell') return `Line ${line} holds a spreadsheet formula in ${column} instead of a number; the row was left out.`;
  return `Line ${line} has a value in ${column} that is not a number; the row was left out.`;
}
