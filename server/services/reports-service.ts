import { randomUUID } from 'node:crypto';
import { buildReportSnapshot, type ReportSnapshot } from '#shared/lab/report-snapshot.ts';
import { RUN_TRANSITIONS } from '#shared/lab/run-workflow.ts';
import type { LabReport, PublicReport, ReportBody } from '#shared/schemas/reports.ts';
import { AppError, notFound, validationFailed } from '../core/app-error.ts';
import { callerUser, type Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import type { Db } from '../db/knex.ts';
import { reportsRepo, type ReportRecord } from '../db/repos/reports-repo.ts';
import { runsRepo } from '../db/repos/runs-repo.ts';
import { renderMarkdown } from '../reports/render-markdown.ts';
import { audit } from './audit.ts';
import { assertCan } from './permissions.ts';
import { snapshotModel, snapshotRunInput } from './report-inputs.ts';
import { publicView, reportFunding } from './report-view.ts';

/** `Corvane Photonics`, `Fenwick torso panel` → `corvane-photonics-fenwick-torso-panel`. */
export function slugOf(...parts: string[]): string {
  return parts
    .join(' ')
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/&/g, ' and ')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80);
}

/** Reports for staff: a draft over approved runs, its preview, publication, corrections, retraction. */
export interface ReportHooks {
  /** Runs inside the publication's transaction (new-report e-mails are queued there, or not at all). */
  onPublished?: (trx: Db, reportId: string, version: number, kind: 'publish' | 'correct') => Promise<void>;
  /** After a publication, correction or retraction has committed (the public side forgets what it remembered). */
  afterPublicChange?: () => void;
}

export function createReportsService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'queue'>, hooks: ReportHooks = {}) {
  const loadRuns = async (db: Db, runIds: readonly string[]) => {
    const runs = [];
    for (const id of runIds) {
      const run = await runsRepo.findById(db, id);
      if (!run) throw validationFailed([{ path: 'body.runIds', message: `No run ${id}.` }]);
      runs.push(run);
    }
    return runs;
  };

  const snapshotOf = async (db: Db, report: ReportRecord): Promise<ReportSnapshot> => {
    const runs = await loadRuns(db, await reportsRepo.runIds(db, report.id));
    return buildReportSnapshot(await snapshotModel(db, report.modelId), await Promise.all(runs.map((r) => snapshotRunInput(db, r))));
  };

  const labView = async (db: Db, id: string): Promise<LabReport> => {
    const found = (await reportsRepo.listForLab(db)).find((r) => r.id === id);
    if (!found) throw notFound('That report');
    return found;
  };

  return {
    async list(caller: Caller): Promise<LabReport[]> {
      assertCan(caller, 'lab.enter');
      return reportsRepo.listForLab(deps.db);
    },

    async get(caller: Caller, id: string): Promise<LabReport> {
      assertCan(caller, 'lab.enter');
      return labView(deps.db, id);
    },

    async create(caller: Caller, body: ReportBody & { bodyMarkdown: string }): Promise<LabReport> {
      assertCan(caller, 'reports.publish');
      const id = randomUUID();
      await deps.db.transaction(async (trx) => {
        const runs = await loadRuns(trx, [...new Set(body.runIds)]);
        const notApproved = runs.filter((r) => r.status !== 'approved');
        if (notApproved.length > 0) {
          throw new AppError('conflict', `A report can be made only of approved runs; ${notApproved.map((r) => `${r.unitSerial} (${r.status.replace('_', ' ')})`).join(', ')} ${notApproved.length === 1 ? 'is' : 'are'} not.`, {
            runIds: notApproved.map((r) => r.id),
          });
        }
        if (new Set(runs.map((r) => r.modelId)).size > 1) {
          throw validationFailed([{ path: 'body.runIds', message: 'A report covers runs of one model only.' }]);
        }
        const base = slugOf(runs[0].makerName, runs[0].modelName);
        let slug = base;
        for (let k = 2; await reportsRepo.slugTaken(trx, slug); k++) slug = `${base}-${k}`;
        await reportsRepo.insert(trx, {
          id,
          slug,
          modelId: runs[0].modelId,
          title: body.title,
          summary: body.summary,
          bodyMarkdown: body.bodyMarkdown,
          createdBy: callerUser(caller)?.id ?? runs[0].measuredById,
          runIds: runs.map((r) => r.id),
          now: deps.clock.now(),
        });
        await audit({ trx, clock: deps.clock, caller, action: 'report.create', entity: { type: 'report', id }, after: { status: 'draft', slug, runIds: runs.map((r) => r.id) } });
      });
      return labView(deps.db, id);
    },

    async updateDraft(caller: Caller, id: string, changes: { title?: string; summary?: string; bodyMarkdown?: string }): Promise<LabReport> {
      assertCan(caller, 'reports.publish');
      await deps.db.transaction(async (trx) => {
        const report = await reportsRepo.findById(trx, id, { lock: true });
        if (!report) throw notFound('That report');
        if (report.status !== 'draft') throw new AppError('conflict', 'A published report changes only through a correction, with a note.');
        await reportsRepo.updateDraft(trx, id, changes, deps.clock.now());
        await audit({ trx, clock: deps.clock, caller, action: 'report.update', entity: { type: 'report', id }, after: { status: 'draft' } });
      });
      return labView(deps.db, id);
    },

    /** Exactly what the public would see if the draft (or the next correction) were published now. */
    async preview(caller: Caller, id: string): Promise<PublicReport> {
      assertCan(caller, 'reports.publish');
      const report = await reportsRepo.findById(deps.db, id);
      if (!report) throw notFound('That report');
      const snapshot = await snapshotOf(deps.db, report);
      const versions = await reportsRepo.versionList(deps.db, id);
      const now = deps.clock.now().toISOString();
      return {
        ...publicView(
          report,
          { version: report.currentVersion + 1, title: report.draftTitle, summary: report.draftSummary, bodyMarkdown: report.draftBodyMarkdown, bodyHtml: renderMarkdown(report.draftBodyMarkdown), snapshot, changeNote: null, publishedAt: now },
          [...versions, { version: report.currentVersion + 1, publishedAt: now, changeNote: null }],
          versions[0]?.publishedAt ?? now,
          '',
          await reportFunding(deps.db, id),
        ),
        preview: true,
      };
    },

    async publish(caller: Caller, id: string): Promise<LabReport> {
      assertCan(caller, 'reports.publish');
      await deps.db.transaction(async (trx) => {
        const report = await reportsRepo.findById(trx, id, { lock: true });
        if (!report) throw notFound('That report');
        if (report.status !== 'draft') throw new AppError('conflict', `This report is already ${report.status}; publish a correction instead.`);
        const now = deps.clock.now();
        const snapshot = await snapshotOf(trx, report);
        await reportsRepo.addVersion(trx, id, {
          version: 1,
          title: report.draftTitle,
          summary: report.draftSummary,
          bodyMarkdown: report.draftBodyMarkdown,
          bodyHtml: renderMarkdown(report.draftBodyMarkdown),
          snapshot,
          changeNote: null,
          publishedAt: now.toISOString(),
          publishedBy: callerUser(caller)?.id ?? null,
        });
        for (const runId of await reportsRepo.runIds(trx, id)) {
          const t = RUN_TRANSITIONS.publish;
          const moved = await runsRepo.transition(trx, runId, t.from, t.to, {}, now);
          if (!moved) throw new AppError('conflict', 'A run of this report is no longer approved. Reload and check its state.');
          await audit({ trx, clock: deps.clock, caller, action: 'run.publish', entity: { type: 'run', id: runId }, before: { status: 'approved' }, after: { status: 'published', note: `Published in report ${report.slug}.` } });
        }
        await audit({ trx, clock: deps.clock, caller, action: 'report.publish', entity: { type: 'report', id }, before: { status: 'draft' }, after: { status: 'published', version: 1, slug: report.slug } });
        await hooks.onPublished?.(trx, id, 1, 'publish');
      });
      hooks.afterPublicChange?.();
      return labView(deps.db, id);
    },

    /** A new published version with a change note; the earlier ones stay readable at their own URL. */
    async correct(caller: Caller, id: string, body: { changeNote: string; title?: string; summary?: string; bodyMarkdown?: string }): Promise<LabReport> {
      assertCan(caller, 'reports.publish');
      await deps.db.transaction(async (trx) => {
        const report = await reportsRepo.findById(trx, id, { lock: true });
        if (!report) throw notFound('That report');
        if (report.status !== 'published') throw new AppError('conflict', report.status === 'draft' ? 'Publish the report first.' : 'A retracted report is not corrected.');
        const current = (await reportsRepo.version(trx, id, report.currentVersion))!;
        const next = {
          title: body.title ?? current.title,
          summary: body.summary ?? current.summary,
          bodyMarkdown: body.bodyMarkdown ?? current.bodyMarkdown,
        };
        await reportsRepo.updateDraft(trx, id, next, deps.clock.now());
        const version = report.currentVersion + 1;
        await reportsRepo.addVersion(trx, id, {
          version,
          ...next,
          bodyHtml: renderMarkdown(next.bodyMarkdown),
          snapshot: await snapshotOf(trx, report),
          changeNote: body.changeNote,
          publishedAt: deps.clock.now().toISOString(),
          publishedBy: callerUser(caller)?.id ?? null,
        });
        await audit({ trx, clock: deps.clock, caller, action: 'report.correct', entity: { type: 'report', id }, before: { status: 'published', version: report.currentVersion }, after: { status: 'published', version, note: body.changeNote } });
        await hooks.onPublished?.(trx, id, version, 'correct');
      });
      hooks.afterPublicChange?.();
      return labView(deps.db, id);
    },

    async retract(caller: Caller, id: string, reason: string): Promise<LabReport> {
      assertCan(caller, 'reports.publish');
      await deps.db.transaction(async (trx) => {
        const report = await reportsRepo.findById(trx, id, { lock: true });
        if (!report) throw notFound('That report');
        if (report.status !== 'published') throw new AppError('conflict', report.status === 'draft' ? 'A draft is not public: there is nothing to retract.' : 'This report is already retracted.');
        await reportsRepo.retract(trx, id, reason, deps.clock.now());
        await audit({ trx, clock: deps.clock, caller, action: 'report.retract', entity: { type: 'report', id }, before: { status: 'published' }, after: { status: 'retracted', note: reason } });
      });
      hooks.afterPublicChange?.();
      return labView(deps.db, id);
    },
  };
}
export type ReportsService = ReturnType<typeof createReportsService>;
