/** One problem found while reading a file. The importer reports these instead of throwing. */
export type ImportIssueSeverity = 'error' | 'warning';

export interface ImportIssue {
  /** 1-based line of the file, or null when the issue concerns the whole file. */
  line: number | null;
  /** Stable machine-readable code (snake_case); clients and tests branch on it. */
  code: string;
  severity: ImportIssueSeverity;
  /** A sentence a bench tester understands. */
  message: string;
}

export function issue(
  line: number | null,
  code: string,
  severity: ImportIssueSeverity,
  message: string,
): ImportIssue {
  return { line, code, severity, message };
}
