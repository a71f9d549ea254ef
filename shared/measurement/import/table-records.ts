/**
 * The rows of a located table, split by csv-parse: quoted fields (a delimiter, a decimal comma or
 * a line break inside quotes, `""` for a quote), comment lines (`#` first) and blank lines. Our own
 * code has already found where the rows start and which delimiter they use; this file keeps each
 * record's line in the file so that issues stay located.
 *
 * Speed (csv-parse 7): every record whose width differs from the first one costs an error object
 * (about 30 µs, even with relax_column_count), and asking for line numbers (`info: true`) makes the
 * whole pass about 4× slower. So parsing starts at the first data row, not at the header (rows
 * ending in a delimiter are wider than it), and line numbers are only asked for when records and
 * lines may not pair up one to one: when the rows hold a double quote, a `#` or a blank line.
 */
import { parse, type Info, type Options } from '#csv-parse/sync';
import { isBlankLine, type Delimiter } from './delimited-fields.ts';
import { lineStart, type TextLines } from './text-lines.ts';

export interface TableRecords {
  /** Cells of each record: unquoted, leading spaces dropped (trailing ones are left to the number reader). */
  records: string[][];
  /** 1-based line of the file on which each record starts. */
  lines: Int32Array;
}

/**
 * `from`: index (0-based) of the first line after the header. A line that opens a double quote
 * never closed would swallow the rest of the file; it comes back as one cell holding the whole
 * line (so the importer reports it as a bad row) and reading goes on from the next line.
 */
export function readTableRecords(source: TextLines, from: number, delimiter: Delimiter): TableRecords {
  let part = parseRows(source, from, delimiter);
  let { records, lines } = part;
  while (part.unclosedQuote) {
    const opener = nextUnskippedLine(source.lines, part.lines.length > 0 ? part.lines[part.lines.length - 1] : part.from);
    if (opener >= source.lines.length) break;
    part = parseRows(source, opener + 1, delimiter);
    records = [...records, [source.lines[opener]], ...part.records];
    lines = Int32Array.from([...lines, opener + 1, ...part.lines]);
  }
  return { records, lines };
}

/** A record of empty cells, e.g. a line `;;;` left by a spreadsheet. */
export function isEmptyRecord(cells: readonly string[]): boolean {
  return cells.every((c) => c.trim() === '');
}

function parseRows(source: TextLines, from: number, delimiter: Delimiter): TableRecords & { from: number; unclosedQuote: boolean } {
  // A blank first record would set the expected width and make every later row "inconsistent".
  while (from < source.lines.length && (isBlankLine(source.lines[from]) || isComment(source.lines[from]))) from++;
  const rows = source.text.slice(lineStart(source, from));
  let unclosedQuote = false;
  const options: Options = {
    // Space-separated: any run of spaces or tabs is one delimiter (empty cells are dropped below).
    delimiter: delimiter === ' ' ? [' ', '\t'] : delimiter,
    record_delimiter: source.lineBreak === '\n' ? ['\r\n', '\n'] : ['\r'],
    comment: '#',
    comment_no_infix: true,
    // Not rtrim: csv-parse rejects a character after a closing quote when it trims the right side.
    ltrim: true,
    relax_quotes: true,
    relax_column_count: true,
    skip_empty_lines: true,
    // With these options the only error left is a quote still open at the end: keep the records before it.
    skip_records_with_error: true,
    on_skip: () => {
      unclosedQuote = true;
    },
  };

  let records: string[][];
  let lines: Int32Array;
  const blankLine = source.lineBreak === '\n' ? /\n[^\S\n]*\n/ : /\r[^\S\r]*\r/;
  if (!rows.includes('"') && !rows.includes('#') && !blankLine.test(rows)) {
    records = parse(rows, options);
    lines = new Int32Array(records.length);
    for (let k = 0; k < records.length; k++) lines[k] = from + 1 + k;
  } else {
    // Not info.lines: csv-parse counts every \r as a line break and a quoted \r\n as two.
    // The typings do not model `info: true`, which wraps each record.
    const parsed = parse(rows, { ...options, info: true }) as unknown as { record: string[]; info: Info }[];
    records = new Array<string[]>(parsed.length);
    lines = new Int32Array(parsed.length);
    let quotedBreaks = 0;
    for (let k = 0; k < parsed.length; k++) {
      const { record, info } = parsed[k];
      records[k] = record;
      lines[k] = from + 1 + k + info.empty_lines + info.comment_lines + quotedBreaks;
      for (const cell of record) if (cell.includes(source.lineBreak)) quotedBreaks += cell.split(source.lineBreak).length - 1;
    }
  }
  if (delimiter === ' ') records = records.map((cells) => cells.filter((c) => c !== ''));
  return { records, lines, from, unclosedQuote };
}

function isComment(line: string): boolean {
  return line.trimStart().startsWith('#');
}

/** The first line from `index` on that csv-parse does not skip as blank or comment. */
function nextUnskippedLine(lines: readonly string[], index: number): number {
  while (index < lines.length && (lines[index].trim() === '' || isComment(lines[index]))) index++;
  return index;
}
