import type { Knex } from 'knex';
import type { LabReport } from '#shared/schemas/reports.ts';
import { iso } from './list-page.ts';

export interface ReportRecord {
  id: string;
  slug: string;
  modelId: string;
  status: 'draft' | 'published' | 'retracted';
  currentVersion: number;
  draftTitle: string;
  draftSummary: string;
  draftBodyMarkdown: string;
  createdAt: string;
  updatedAt: string;
  retractedAt: string | null;
  retractionReason: string | null;
}

export interface ReportVersionRecord {
  version: number;
  title: string;
  summary: string;
  bodyMarkdown: string;
  bodyHtml: string;
  snapshot: unknown;
  changeNote: string | null;
  publishedAt: string;
}

function toRecord(r: any): ReportRecord {
  return {
    id: r.id,
    slug: r.slug,
    modelId: r.model_id,
    status: r.status,
    currentVersion: r.current_version,
    draftTitle: r.draft_title,
    draftSummary: r.draft_summary,
    draftBodyMarkdown: r.draft_body_markdown,
    createdAt: iso(r.created_at)!,
    updatedAt: iso(r.updated_at)!,
    retractedAt: iso(r.retracted_at),
    retractionReason: r.retraction_reason,
  };
}

function toVersion(r: any): ReportVersionRecord {
  return {
    version: r.version,
    title: r.title,
    summary: r.summary,
    bodyMarkdown: r.body_markdown,
    bodyHtml: r.body_html,
    snapshot: r.snapshot,
    changeNote: r.change_note,
    publishedAt: iso(r.published_at)!,
  };
}

export const reportsRepo = {
  async slugTaken(db: Knex, slug: string): Promise<boolean> {
    return Boolean(await db('reports').where({ slug }).first('id'));
  },

  async insert(db: Knex, r: { id: string; slug: string; modelId: string; title: string; summary: string; bodyMarkdown: string; createdBy: string; runIds: string[]; now: Date }): Promise<void> {
    await db('reports').insert({
      id: r.id,
      slug: r.slug,
      model_id: r.modelId,
      status: 'draft',
      current_version: 0,
      draft_title: r.title,
      draft_summary: r.summary,
      draft_body_markdown: r.bodyMarkdown,
      created_by: r.createdBy,
      created_at: r.now,
      updated_at: r.now,
    });
    await db('report_runs').insert(r.runIds.map((runId, position) => ({ report_id: r.id, run_id: runId, position })));
  },

  async findById(db: Knex, id: string, opts: { lock?: boolean } = {}): Promise<ReportRecord | null> {
    const q = db('reports').where({ id });
    if (opts.lock) q.forUpdate();
    const r = await q.first();
    return r ? toRecord(r) : null;
  },

  async findBySlug(db: Knex, slug: string): Promise<ReportRecord | null> {
    const r = await db('reports').where({ slug }).first();
    return r ? toRecord(r) : null;
  },

  async runIds(db: Knex, reportId: string): Promise<string[]> {
    return (await db('report_runs').where({ report_id: reportId }).orderBy('position').select('run_id')).map((r) => r.run_id as string);
  },

  async updateDraft(db: Knex, id: string, changes: { title?: string; summary?: string; bodyMarkdown?: string }, now: Date): Promise<void> {
    await db('reports')
      .where({ id })
      .update({
        ...(changes.title !== undefined ? { draft_title: changes.title } : {}),
        ...(changes.summary !== undefined ? { draft_summary: changes.summary } : {}),
        ...(changes.bodyMarkdown !== undefined ? { draft_body_markdown: changes.bodyMarkdown } : {}),
        updated_at: now,
      });
  },

  async addVersion(db: Knex, reportId: string, v: ReportVersionRecord & { publishedBy: string | null }): Promise<void> {
    await db('report_versions').insert({
      report_id: reportId,
      version: v.version,
      title: v.title,
      summary: v.summary,
      body_markdown: v.bodyMarkdown,
      body_html: v.bodyHtml,
      snapshot: JSON.stringify(v.snapshot),
      change_note: v.changeNote,
      published_by: v.publishedBy,
      published_at: v.publishedAt,
    });
    await db('reports').where({ id: reportId }).update({ status: 'published', current_version: v.version, updated_at: v.publishedAt });
  },

  async retract(db: Knex, id: string, reason: string, now: Date): Promise<void> {
    await db('reports').where({ id }).update({ status: 'retracted', retracted_at: now, retraction_reason: reason, updated_at: now });
  },

  async version(db: Knex, reportId: string, version: number): Promise<ReportVersionRecord | null> {
    const r = await db('report_versions').where({ report_id: reportId, version }).first();
    return r ? toVersion(r) : null;
  },

  async versionList(db: Knex, reportId: string): Promise<{ version: number; publishedAt: string; changeNote: string | null }[]> {
    const rows = await db('report_versions').where({ report_id: reportId }).orderBy('version').select('version', 'published_at', 'change_note');
    return rows.map((r) => ({ version: r.version, publishedAt: iso(r.published_at)!, changeNote: r.change_note }));
  },

  /** A stamp that changes whenever anything public may have changed: the count and last change of public reports. */
  async publicStamp(db: Knex): Promise<string> {
    const r = await db('reports').whereIn('status', ['published', 'retracted']).first(db.raw('count(*)::int as n'), db.raw('max(updated_at) as last'));
    return `${r?.n ?? 0}:${r?.last ? iso(r.last) : ''}`;
  },

  /** Published and retracted reports with their current version (for the index, feed and sitemap). */
  async currentVersions(db: Knex, statuses: readonly ('published' | 'retracted')[]): Promise<{ report: ReportRecord; version: ReportVersionRecord; firstPublishedAt: string }[]> {
    const rows = await db('reports as r')
      .join('report_versions as v', function () {
        this.on('v.report_id', '=', 'r.id').andOn('v.version', '=', 'r.current_version');
      })
      .whereIn('r.status', statuses as string[])
      .select(
        'r.*',
        'v.version',
        'v.title',
        'v.summary',
        'v.body_markdown',
        'v.body_html',
        'v.snapshot',
        'v.change_note',
        'v.published_at',
        db.raw('(select min(published_at) from report_versions f where f.report_id = r.id) as first_published_at'),
      )
      .orderBy('v.published_at', 'desc');
    return rows.map((r) => ({ report: toRecord(r), version: toVersion(r), firstPublishedAt: iso(r.first_published_at)! }));
  },

  /** Every version ever published, newest first (the feed shows corrections as updates). */
  async allVersions(db: Knex): Promise<{ slug: string; status: string; version: ReportVersionRecord }[]> {
    const rows = await db('report_versions as v').join('reports as r', 'r.id', 'v.report_id').whereIn('r.status', ['published', 'retracted']).select('r.slug', 'r.status', 'v.*').orderBy('v.published_at', 'desc');
    return rows.map((r) => ({ slug: r.slug, status: r.status, version: toVersion(r) }));
  },

  async listForLab(db: Knex): Promise<LabReport[]> {
    const rows = await db('reports as r')
      .join('models as md', 'md.id', 'r.model_id')
      .join('makers as mk', 'mk.id', 'md.maker_id')
      .select('r.*', 'md.name as model_name', 'mk.name as maker_name', db.raw('(select max(published_at) from report_versions v where v.report_id = r.id) as published_at'), db.raw("(select array_agg(run_id order by position) from report_runs rr where rr.report_id = r.id) as run_ids"))
      .orderBy('r.updated_at', 'desc');
    return rows.map((r) => ({
      id: r.id,
      slug: r.slug,
      status: r.status,
      version: r.current_version,
      title: r.draft_title,
      summary: r.draft_summary,
      bodyMarkdown: r.draft_body_markdown,
      modelId: r.model_id,
      modelName: r.model_name,
      makerName: r.maker_name,
      runIds: r.run_ids ?? [],
      publishedAt: iso(r.published_at),
      retractedAt: iso(r.retracted_at),
      retractionReason: r.retraction_reason,
      createdAt: iso(r.created_at)!,
      updatedAt: iso(r.updated_at)!,
    }));
  },
};
