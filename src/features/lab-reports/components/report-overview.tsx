import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { LabReport } from '#shared/schemas/reports.ts';
import { formatDate } from '#src/lib/format.ts';
import { ReportStatusBadge } from './report-status-badge.tsx';

function Item({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="grid gap-1 sm:grid-cols-[11rem_minmax(0,1fr)]">
      <dt className="font-sans text-sm font-semibold text-ink-soft">{term}</dt>
      <dd className="font-sans text-sm">{children}</dd>
    </div>
  );
}

/** Where a report stands: state, version, model, its runs, its dates and addresses. */
export function ReportOverview({ report }: { report: LabReport }) {
  return (
    <dl className="space-y-2">
      <Item term="State">
        <ReportStatusBadge status={report.status} />
        {report.status !== 'draft' ? <span className="ml-2">version {report.version}</span> : null}
      </Item>
      <Item term="Model">
        {report.makerName} {report.modelName}
      </Item>
      <Item term={report.runIds.length === 1 ? 'Run' : `Runs (${report.runIds.length} units)`}>
        <ul className="space-y-0.5">
          {report.runIds.map((id, i) => (
            <li key={id}>
              <Link to={`/lab/runs/${id}`}>Run {i + 1}</Link> <span className="text-xs text-ink-muted">({id.slice(0, 8)})</span>
            </li>
          ))}
        </ul>
      </Item>
      <Item term="Public address">
        {report.status === 'draft' ? (
          <span>
            /reports/{report.slug} <span className="text-ink-muted">(once published)</span>
          </span>
        ) : (
          <Link to={`/reports/${report.slug}`}>/reports/{report.slug}</Link>
        )}
      </Item>
      <Item term="Created">
        <time dateTime={report.createdAt}>{formatDate(report.createdAt)}</time>
      </Item>
      {report.publishedAt ? (
        <Item term={report.version > 1 ? `Version ${report.version} published` : 'Published'}>
          <time dateTime={report.publishedAt}>{formatDate(report.publishedAt)}</time>
        </Item>
      ) : null}
      <Item term="Last change">
        <time dateTime={report.updatedAt}>{formatDate(report.updatedAt)}</time>
      </Item>
      {report.retractedAt ? (
        <Item term="Retracted">
          <time dateTime={report.retractedAt}>{formatDate(report.retractedAt)}</time>: {report.retractionReason}
        </Item>
      ) : null}
    </dl>
  );
}
