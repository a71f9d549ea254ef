import type { ReportSnapshot } from '#shared/lab/report-snapshot.ts';
import type { PublicReport, ReportFunding } from '#shared/schemas/reports.ts';
import type { Db } from '../db/knex.ts';
import { pledgesRepo } from '../db/repos/pledges-repo.ts';
import type { ReportRecord, ReportVersionRecord } from '../db/repos/reports-repo.ts';

/**
 * How a report's test was paid for, read now rather than frozen with the figures: a request may
 * be marked tested with the report after it is published, and a payment may be refunded.
 */
export async function reportFunding(db: Db, reportId: string): Promise<ReportFunding> {
  const f = await pledgesRepo.fundingOfReport(db, reportId);
  return f.readers > 0 ? { kind: 'readers', readers: f.readers, amounts: f.amounts } : { kind: 'lab' };
}

/** "Benchlight (2026). Title, version 2. https://…/reports/slug/versions/2": a reader can cite one version. */
export function citationOf(title: string, version: number, publishedAt: string, url: string): string {
  return `Benchlight independent test lab (${publishedAt.slice(0, 4)}). “${title}”, version ${version}, published ${publishedAt.slice(0, 10)}. ${url}`;
}

/** One published version of a report as the public API answers it. */
export function publicView(
  report: ReportRecord,
  version: ReportVersionRecord,
  versions: { version: number; publishedAt: string; changeNote: string | null }[],
  firstPublishedAt: string,
  baseUrl: string,
  funding: ReportFunding,
): PublicReport {
  const snapshot = version.snapshot as ReportSnapshot;
  return {
    ...snapshot,
    slug: report.slug,
    title: version.title,
    summary: version.summary,
    bodyHtml: version.bodyHtml,
    version: version.version,
    latestVersion: Math.max(report.currentVersion, version.version),
    publishedAt: version.publishedAt,
    firstPublishedAt: firstPublishedAt || version.publishedAt,
    changeNote: version.changeNote,
    versions,
    retracted: report.status === 'retracted' && report.retractedAt ? { at: report.retractedAt, reason: report.retractionReason ?? '' } : null,
    category: snapshot.model.category,
    citation: citationOf(version.title, version.version, version.publishedAt, `${baseUrl}/reports/${report.slug}/versions/${version.version}`),
    funding,
  };
}
