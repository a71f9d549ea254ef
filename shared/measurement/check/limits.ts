import { issue, type ImportIssue } from '../import/import-issue.ts';

/**
 * The largest instrument file Benchlight reads, wherever it is read: the bench CLI, the File check
 * page and the upload. Spectrum exports and meter grids are kilobytes; a file this large is not
 * one, and reading it would only stall the reader.
 */
export const MAX_INSTRUMENT_FILE_BYTES = 5 * 1024 * 1024;

export function formatMegabytes(bytes: number): string {
  return `${Number((bytes / (1024 * 1024)).toFixed(1))} MB`;
}

/** The file-level issue for a file over the limit, or null when it is within it. */
export function sizeIssue(sizeBytes: number): ImportIssue | null {
  if (sizeBytes <= MAX_INSTRUMENT_FILE_BYTES) return null;
  return issue(
    null,
    'file_too_large',
    'error',
    `The file is ${formatMegabytes(sizeBytes)}, over the ${formatMegabytes(MAX_INSTRUMENT_FILE_BYTES)} limit for one instrument file; exports are far smaller, so it was not read.`,
  );
}
