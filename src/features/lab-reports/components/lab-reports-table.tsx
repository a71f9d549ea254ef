import { Link } from 'react-router-dom';
import type { LabReport } from '#shared/schemas/reports.ts';
import { formatDate } from '#src/lib/format.ts';
import { ReportStatusBadge } from './report-status-badge.tsx';

const th = 'bl-label border-y border-rule px-4 py-2 text-left align-bottom';
const td = 'px-4 py-3 text-sm align-top font-sans';

/** The lab's reports, newest change first: state, version, model, dates, and where each can be read. */
export function LabReportsTable({ reports, canPublish }: { reports: readonly LabReport[]; canPublish: boolean }) {
  const rows = [...reports].sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
  return (
    <div role="region" aria-labelledby="lab-reports-caption" tabIndex={0} className="relative overflow-x-auto rounded-md border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left">
        <caption id="lab-reports-caption" className="px-4 pt-3 pb-2 text-left text-lg font-semibold">
          Reports
        </caption>
        <thead className="bg-paper-sunk">
          <tr>
            <th scope="col" className={th}>Title</th>
            <th scope="col" className={th}>State</th>
            <th scope="col" className={`${th} text-right`}>Version</th>
            <th scope="col" className={th}>Model</th>
            <th scope="col" className={th}>Runs</th>
            <th scope="col" className={th}>Published</th>
            <th scope="col" className={th}>Last change</th>
            <th scope="col" className={th}>Read it</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id} className="border-b border-rule last:border-b-0">
              <th scope="row" className="px-4 py-3 text-left align-top font-sans text-sm font-semibold">
                <Link to={`/lab/reports/${r.id}`}>{r.title}</Link>
              </th>
              <td className={td}>
                <ReportStatusBadge status={r.status} />
              </td>
              <td className={`${td} text-right tabular-nums`}>{r.status === 'draft' ? '—' : r.version}</td>
              <td className={td}>
                {r.makerName} {r.modelName}
              </td>
              <td className={`${td} tabular-nums`}>{r.runIds.length}</td>
              <td className={td}>
                {r.publishedAt ? <time dateTime={r.publishedAt}>{formatDate(r.publishedAt)}</time> : <span className="text-ink-muted">not yet</span>}
                {r.retractedAt ? (
                  <span className="block text-xs text-danger">
                    retracted <time dateTime={r.retractedAt}>{formatDate(r.retractedAt)}</time>
                  </span>
                ) : null}
              </td>
              <td className={td}>
                <time dateTime={r.updatedAt}>{formatDate(r.updatedAt)}</time>
              </td>
              <td className={td}>
                <ul className="space-y-1">
                  {r.status !== 'draft' ? (
                    <li>
                      <Link to={`/reports/${r.slug}`}>Public page</Link>
                    </li>
                  ) : null}
                  {canPublish && r.status === 'draft' ? (
                    <li>
                      <Link to={`/lab/reports/${r.id}/preview`}>Preview</Link>
                    </li>
                  ) : null}
                </ul>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
