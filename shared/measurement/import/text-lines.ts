import { issue, type ImportIssue } from './import-issue.ts';

/**
 * First step of every importer: refuse what is not text, drop a UTF-8 byte-order mark and cut
 * the text into lines (LF, CRLF or old-style CR). Line i of `lines` is line i + 1 of the file.
 * The lines serve header detection, the preamble and issue messages; csv-parse splits the rows.
 */
export interface TextLines {
  /** The text without its byte-order mark. */
  text: string;
  lines: string[];
  /** `\n` for LF and CRLF files, `\r` for files that have no LF at all. */
  lineBreak: '\n' | '\r';
}

export type TextLinesResult = ({ issue: null } & TextLines) | { lines: null; issue: ImportIssue };

const SAMPLE_CHARS = 8192;

export function splitTextLines(text: string): TextLinesResult {
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  if (text.trim() === '') {
    return { lines: null, issue: issue(null, 'empty_file', 'error', 'The file is empty.') };
  }
  const problem = notTextProblem(text);
  if (problem) return { lines: null, issue: problem };

  const lineBreak = text.includes('\n') ? '\n' : '\r';
  const lines = text.split(lineBreak);
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i];
    if (line.charCodeAt(line.length - 1) === 13) lines[i] = line.slice(0, -1);
  }
  return { text, lines, lineBreak, issue: null };
}

/** Character offset in `text` where line `index` (0-based) starts. */
export function lineStart({ text, lineBreak }: TextLines, index: number): number {
  let at = 0;
  for (let i = 0; i < index; i++) {
    const end = text.indexOf(lineBreak, at);
    if (end === -1) return text.length;
    at = end + 1;
  }
  return at;
}

/** UTF-16 read as UTF-8 shows a NUL beside every ASCII character; other binaries show control bytes. */
function notTextProblem(text: string): ImportIssue | null {
  const sample = text.slice(0, SAMPLE_CHARS);
  const nulAt = [0, 0]; // NULs at even and odd positions
  let control = 0;
  for (let i = 0; i < sample.length; i++) {
    const c = sample.charCodeAt(i);
    if (c === 0) nulAt[i & 1]++;
    else if ((c < 32 && c !== 9 && c !== 10 && c !== 13) || c === 0xfffd) control++;
  }
  const half = sample.length / 2;
  const alternating = (nulAt[0] > half * 0.7 && nulAt[1] < half * 0.1) || (nulAt[1] > half * 0.7 && nulAt[0] < half * 0.1);
  if (alternating) {
    return issue(
      null,
      'utf16',
      'error',
      'The file looks like UTF-16 text read as UTF-8. Save it as UTF-8 (or plain CSV) and upload it again.',
    );
  }
  if (nulAt[0] + nulAt[1] > 0 || control > sample.length * 0.05) {
    return issue(
      null,
      'not_text',
      'error',
      'The file is not a text export (it contains binary data). Export the spectrum as CSV or tab-separated text.',
    );
  }
  return null;
}
