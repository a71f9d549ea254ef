import type { ImportIssue } from '#shared/measurement/import/import-issue.ts';
import { cn } from '../lib/cn.ts';

/** Errors first (they decide whether the file is usable), then warnings, each in file order. */
function ordered(issues: readonly ImportIssue[]): ImportIssue[] {
  const rank = (i: ImportIssue) => (i.severity === 'error' ? 0 : 1);
  return [...issues].sort((a, b) => rank(a) - rank(b) || (a.line ?? 0) - (b.line ?? 0));
}

/** What the importer found, line by line; severity is said in words as well as colour. */
export function IssueList({ issues, headingId }: { issues: readonly ImportIssue[]; headingId: string }) {
  if (issues.length === 0) {
    return <p className="font-sans text-sm text-ink-soft">No problems found.</p>;
  }
  return (
    <ul aria-labelledby={headingId} className="space-y-1.5">
      {ordered(issues).map((issue, index) => {
        const error = issue.severity === 'error';
        return (
          <li
            key={`${issue.code}-${issue.line ?? 'file'}-${index}`}
            className={cn(
              'rounded border-l-4 px-3 py-2 font-sans text-sm',
              error ? 'border-danger bg-danger-tint text-ink' : 'border-warn bg-warn-tint text-ink',
            )}
          >
            <span className={cn('mr-2 font-semibold', error ? 'text-danger' : 'text-warn')}>
              {error ? 'Error' : 'Warning'}
            </span>{' '}
            <span className="mr-2 font-semibold">{issue.line === null ? 'Whole file' : `Line ${issue.line}`}</span>
            <span className="sr-only">:</span> {issue.message}
          </li>
        );
      })}
    </ul>
  );
}
