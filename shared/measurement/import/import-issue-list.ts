import { issue, type ImportIssue, type ImportIssueSeverity } from './import-issue.ts';

/**
 * Collects the problems found, keeping at most `perCodeLimit` located ones per code so that a file with a
 * thousand bad rows gives a readable list; the rest are counted in one closing warning.
 */
export class ImportIssueList {
  readonly issues: ImportIssue[] = [];
  private readonly counts = new Map<string, number>();

  constructor(private readonly perCodeLimit = 20) {}

  add(line: number | null, code: string, severity: ImportIssueSeverity, message: string): void {
    const seen = (this.counts.get(code) ?? 0) + 1;
    this.counts.set(code, seen);
    if (line === null || seen <= this.perCodeLimit) this.issues.push(issue(line, code, severity, message));
  }

  hasErrors(): boolean {
    return this.issues.some((i) => i.severity === 'error');
  }

  /** Withdraws every report of one code (when a file-level error says it all). */
  remove(code: string): void {
    for (let i = this.issues.length - 1; i >= 0; i--) if (this.issues[i].code === code) this.issues.splice(i, 1);
    this.counts.delete(code);
  }

  /** Adds the summaries of what was left out and returns the list. */
  finish(): ImportIssue[] {
    for (const [code, count] of this.counts) {
      const shown = this.issues.filter((i) => i.code === code).length;
      if (count > shown) {
        this.issues.push(
          issue(null, 'more_issues', 'warning', `${count - shown} more lines have the same problem (${code}).`),
        );
      }
    }
    // Located problems in file order, then those about the whole file.
    return this.issues.sort((a, b) => (a.line ?? Infinity) - (b.line ?? Infinity));
  }
}
