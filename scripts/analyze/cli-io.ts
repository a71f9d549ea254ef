/** What the bench CLI commands share: option parsing, reading a file, hints on issues, issue lines, tidy numbers. */
import { readFile, stat } from 'node:fs/promises';
import { parseArgs } from 'node:util';
import type { ImportIssue } from '#shared/measurement/import/import-issue.ts';
import { formatMegabytes, MAX_INSTRUMENT_FILE_BYTES } from '#shared/measurement/check/limits.ts';

/** What the command line adds to an importer message: its own way to act on it. */
const CLI_HINTS: Readonly<Record<string, string>> = {
  no_unit: 'On the command line, give it with --unit (e.g. --unit uW/cm2/nm).',
  unit_not_spectral: 'On the command line, give the right one with --unit.',
};

/** The issue with the command line's hint appended, when it has one. */
export function withCliHint(i: ImportIssue): ImportIssue {
  const hint = CLI_HINTS[i.code];
  return hint ? { ...i, message: `${i.message} ${hint}` } : i;
}

export type ParsedCommandLine<K extends string> =
  | { ok: true; values: Partial<Record<K, string>>; files: string[]; help: boolean }
  | { ok: false; message: string };

/**
 * `--name value` and `--name=value` for string options, `--help`, `--` and positional files,
 * through node's own parser (strict: an unknown option is an error).
 */
export function parseCommandLine<K extends string>(args: string[], optionNames: readonly K[]): ParsedCommandLine<K> {
  const options: Record<string, { type: 'string' | 'boolean' }> = { help: { type: 'boolean' } };
  for (const name of optionNames) options[name] = { type: 'string' };
  try {
    const { values, positionals } = parseArgs({ args, options, allowPositionals: true, strict: true });
    const { help, ...rest } = values as Record<string, string | boolean | undefined>;
    return { ok: true, values: rest as Partial<Record<K, string>>, files: positionals, help: help === true };
  } catch (err) {
    // node's messages name the option, e.g. "Unknown option '--colour'".
    return { ok: false, message: err instanceof Error ? err.message.split('\n')[0] : String(err) };
  }
}

/** One importer issue as a stderr line: `file:line: severity code: message`. */
export function formatIssue(file: string, i: ImportIssue): string {
  return `${file}${i.line === null ? '' : `:${i.line}`}: ${i.severity} ${i.code}: ${i.message}\n`;
}

/** The file's bytes, or a sentence saying why they cannot be had. */
export async function readInputFile(file: string, whatItIsNot: string): Promise<{ bytes: Uint8Array } | { problem: string; code: string }> {
  try {
    const info = await stat(file);
    if (!info.isFile()) return { code: 'file_unreadable', problem: `${file} is not a file.` };
    if (info.size > MAX_INSTRUMENT_FILE_BYTES) {
      return {
        code: 'file_too_large',
        problem: `${file} is larger than ${formatMegabytes(MAX_INSTRUMENT_FILE_BYTES)}; it is not ${whatItIsNot}.`,
      };
    }
    return { bytes: await readFile(file) };
  } catch (err) {
    const reason = (err as NodeJS.ErrnoException).code === 'ENOENT' ? 'does not exist' : 'cannot be read';
    return { code: 'file_unreadable', problem: `${file} ${reason}.` };
  }
}

export { tidy } from '#shared/measurement/check/grid-report.ts';
