/**
 * The public site's reading side: only published versions, never a draft, a run or anything a
 * reader was not meant to see. A retracted report keeps its page (with the reason) but leaves the
 * index. Answers are plain data; the routes add caching headers.
 */
import { COMBINED_BAND } from '#shared/lab/band-values.ts';
import type { ReportSnapshot } from '#shared/lab/report-snapshot.ts';
import type { PublicReport, PublicReportSummary, ReportFunding } from '#shared/schemas/reports.ts';
import { notFound } from '../core/app-error.ts';
import type { ServiceDeps } from '../core/context.ts';
import { reportsRepo } from '../db/repos/reports-repo.ts';
import { createRenderedCache, type Rendered } from './rendered-cache.ts';
import { publicView, reportFunding } from './report-view.ts';

const csvCell = (v: string | number | null) => (v === null ? '' : typeof v === 'number' ? String(Number(v.toPrecision(10))) : `"${v.replace(/"/g, '""')}"`);

function thumbnail(s: ReportSnapshot): PublicReportSummary['thumbnail'] {
  const serial = s.units[0]?.serial;
  const nearest = Math.min(...s.readings.filter((r) => r.unitSerial === serial).map((r) => r.distanceCm));
  if (!Number.isFinite(nearest)) return null;
  const points = s.readings
    .filter((r) => r.unitSerial === serial && r.distanceCm === nearest && r.values[COMBINED_BAND] !== null)
    .map((r) => ({ xCm: r.xCm, yCm: r.yCm, value: r.values[COMBINED_BAND] as number }));
  return { distanceCm: nearest, points, emittingAreaCm: s.model.emittingAreaCm };
}

const RECHECK_MS = 1000;

export function createPublicReportsService(deps: Pick<ServiceDeps, 'db'>) {
  const load = async (slug: string) => {
    const report = await reportsRepo.findBySlug(deps.db, slug);
    // A draft is not public: it answers exactly as a slug that does not exist.
    if (!report || report.status === 'draft' || report.currentVersion < 1) throw notFound('That report');
    return report;
  };
  const rendered = createRenderedCache();
  // The report row behind a cached answer is re-read at most once a second per slug: under load
  // that spares the database nearly every query; this process's own writes call forget().
  // The funding line is read with it, at the same pace (it is live, not frozen with the figures).
  type Recent = { report: Awaited<ReturnType<typeof load>>; funding: ReportFunding };
  const recent = new Map<string, Recent & { at: number }>();
  const loadRecent = async (slug: string): Promise<Recent> => {
    const hit = recent.get(slug);
    if (hit && Date.now() - hit.at < RECHECK_MS) return hit;
    const report = await load(slug);
    const funding = await reportFunding(deps.db, report.id);
    if (recent.size > 1000) recent.clear();
    recent.set(slug, { report, funding, at: Date.now() });
    return { report, funding };
  };

  const service = {
    /** Drops what is remembered of report rows, after a change made through this process. */
    forget(): void {
      recent.clear();
    },

    async list(): Promise<PublicReportSummary[]> {
      const rows = await reportsRepo.currentVersions(deps.db, ['published']);
      return rows.map(({ report, version, firstPublishedAt }) => {
        const s = version.snapshot as ReportSnapshot;
        return {
          slug: report.slug,
          title: version.title,
          summary: version.summary,
          version: version.version,
          publishedAt: version.publishedAt,
          firstPublishedAt,
          category: s.model.category,
          maker: s.model.makerName,
          model: s.model.name,
          units: s.units.length,
          keyFigures: s.keyFigures,
          thumbnail: thumbnail(s),
        };
      });
    },

    async get(slug: string, versionNumber: number | null, baseUrl: string): Promise<PublicReport> {
      const report = await load(slug);
      const v = versionNumber ?? report.currentVersion;
      const version = await reportsRepo.version(deps.db, report.id, v);
      if (!version) throw notFound('That version of the report');
      const versions = await reportsRepo.versionList(deps.db, report.id);
      return publicView(report, version, versions, versions[0]?.publishedAt ?? version.publishedAt, baseUrl, await reportFunding(deps.db, report.id));
    },

    /** The index as JSON, serialised once per state of the public reports. */
    async listRendered(): Promise<Rendered> {
      const stamp = await reportsRepo.publicStamp(deps.db);
      return rendered.get(`list:${stamp}`, async () => ({ reports: await service.list() }));
    },

    /** One report (or one version of it) as JSON, serialised once per state of that report. */
    async getRendered(slug: string, versionNumber: number | null, baseUrl: string): Promise<Rendered> {
      const { report, funding } = await loadRecent(slug);
      const key = ['report', report.id, versionNumber ?? 'latest', report.status, report.currentVersion, report.updatedAt, baseUrl, JSON.stringify(funding)].join(':');
      return rendered.get(key, async () => ({ report: await service.get(slug, versionNumber, baseUrl) }));
    },

    /** One row per reading, units in the column names. A report over several units adds unit_serial. */
    async readingsCsv(slug: string, versionNumber: number | null): Promise<string> {
      const report = await load(slug);
      const version = await reportsRepo.version(deps.db, report.id, versionNumber ?? report.currentVersion);
      if (!version) throw notFound('That version of the report');
      const s = version.snapshot as ReportSnapshot;
      const several = s.units.length > 1;
      const header = ['distance_cm', 'x_cm', 'y_cm', 'red_mw_cm2', 'nir_mw_cm2', 'combined_mw_cm2', ...(several ? ['unit_serial'] : [])];
      const rows = s.readings.map((r) =>
        [r.distanceCm, r.xCm, r.yCm, r.values.red ?? null, r.values.nir ?? null, r.values[COMBINED_BAND] ?? null, ...(several ? [r.unitSerial] : [])].map(csvCell).join(','),
      );
      return `${[header.join(','), ...rows].join('\n')}\n`;
    },

    /** For the feed and the sitemap: every published version, newest first, and each report's latest. */
    async feedEntries() {
      return reportsRepo.allVersions(deps.db);
    },

    async sitemapEntries() {
      return reportsRepo.currentVersions(deps.db, ['published', 'retracted']);
    },

    /** Title and summary of a report for link previews; null when it is not public. */
    async linkPreview(slug: string): Promise<{ title: string; summary: string } | null> {
      const report = await reportsRepo.findBySlug(deps.db, slug);
      if (!report || report.status === 'draft' || report.currentVersion < 1) return null;
      const version = await reportsRepo.version(deps.db, report.id, report.currentVersion);
      return version ? { title: version.title, summary: version.summary } : null;
    },
  };
  return service;
}
export type PublicReportsService = ReturnType<typeof createPublicReportsService>;
