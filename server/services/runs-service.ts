import { randomUUID } from 'node:crypto';
import { can } from '#shared/auth/capabilities.ts';
import { gridPoints } from '#shared/lab/grid-point.ts';
import { DEFAULT_BANDS } from '#shared/measurement/spectral/band-list.ts';
import { RUN_TRANSITIONS, canTransition, runIsEditable, type RunTransitionName } from '#shared/lab/run-workflow.ts';
import type { AuditEvent, Run, RunBodyParsed, RunListQuery, RunPatch, RunProgress } from '#shared/schemas/runs.ts';
import { AppError, forbidden, notFound, validationFailed } from '../core/app-error.ts';
import { callerLabel, callerUser, type Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { today } from '../core/today.ts';
import type { Db } from '../db/knex.ts';
import { auditRepo } from '../db/repos/audit-repo.ts';
import { deviceUnitsRepo } from '../db/repos/device-units-repo.ts';
import { instrumentsRepo } from '../db/repos/instruments-repo.ts';
import { readingsRepo } from '../db/repos/readings-repo.ts';
import { runAnalysesRepo } from '../db/repos/run-analyses-repo.ts';
import { runCommentsRepo } from '../db/repos/run-comments-repo.ts';
import { runsRepo, type RunRecord } from '../db/repos/runs-repo.ts';
import { usersRepo } from '../db/repos/users-repo.ts';
import { audit } from './audit.ts';
import { assertCan } from './permissions.ts';
import { runFingerprint } from './run-fingerprint.ts';
import { toRun } from './run-view.ts';

type Deps = Pick<ServiceDeps, 'db' | 'clock' | 'queue'>;

/** Runs: creation, conditions, the review workflow, comments and the audit trail. */
export function createRunsService(deps: Deps) {
  const progressOf = async (db: Db, run: RunRecord): Promise<RunProgress> => {
    const counts = await readingsRepo.progress(db, run.id);
    const stored = await runAnalysesRepo.get(db, run.id);
    const analysing = stored === null ? counts.analysed > 0 : stored.fingerprint !== (await runFingerprint(db, run.id, run.bands));
    return { ...counts, analysing, flags: stored?.flags.length ?? 0 };
  };

  const load = async (db: Db, id: string): Promise<RunRecord> => {
    const run = await runsRepo.findById(db, id);
    if (!run) throw notFound('That run');
    return run;
  };

  const view = async (db: Db, run: RunRecord): Promise<Run> => toRun(run, await progressOf(db, run), today(deps.clock));

  return {
    async list(caller: Caller, q: RunListQuery, opts: { statuses?: readonly Run['status'][] } = {}) {
      assertCan(caller, 'lab.enter');
      const { records, total } = await runsRepo.list(deps.db, { ...q, statuses: opts.statuses });
      const items = await Promise.all(records.map((r) => view(deps.db, r)));
      return { items, total, page: q.page, pageSize: q.pageSize };
    },

    async get(caller: Caller, id: string): Promise<Run> {
      assertCan(caller, 'lab.enter');
      return view(deps.db, await load(deps.db, id));
    },

    /** The stored record, for other services (uploads, processing). */
    async record(caller: Caller, id: string): Promise<RunRecord> {
      assertCan(caller, 'lab.enter');
      return load(deps.db, id);
    },

    async create(caller: Caller, body: RunBodyParsed): Promise<Run> {
      assertCan(caller, 'runs.create');
      const creator = callerUser(caller);
      const measuredById = body.measuredById ?? creator?.id;
      if (!measuredById) throw validationFailed([{ path: 'body.measuredById', message: 'Say who measured the run.' }]);
      const id = randomUUID();
      await deps.db.transaction(async (trx) => {
        const problems: { path: string; message: string }[] = [];
        if (!(await deviceUnitsRepo.findById(trx, body.unitId))) problems.push({ path: 'body.unitId', message: 'No such unit.' });
        if (!(await instrumentsRepo.findById(trx, body.instrumentId, today(deps.clock)))) problems.push({ path: 'body.instrumentId', message: 'No such instrument.' });
        const measurer = await usersRepo.findById(trx, measuredById);
        if (!measurer || !measurer.active || measurer.role === undefined) problems.push({ path: 'body.measuredById', message: 'No such member of staff.' });
        if (problems.length > 0) throw validationFailed(problems);
        await runsRepo.insert(trx, {
          id,
          unitId: body.unitId,
          instrumentId: body.instrumentId,
          grid: body.grid,
          bands: body.bands ?? { ...DEFAULT_BANDS },
          centerChecks: body.centerChecks,
          roomTempC: body.conditions?.roomTempC ?? null,
          warmupMinutes: body.conditions?.warmupMinutes ?? null,
          mainsVoltageV: body.conditions?.mainsVoltageV ?? null,
          notes: body.notes ?? '',
          measuredById,
          measuredOn: body.measuredOn ?? today(deps.clock),
          createdById: creator?.id ?? measuredById,
          now: deps.clock.now(),
        });
        const points = gridPoints(body.grid).map((p) => ({ id: randomUUID(), runId: id, slot: 'grid' as const, ...p }));
        const checks = body.centerChecks
          ? body.grid.distancesCm.flatMap((distanceCm) =>
              (['center_start', 'center_end'] as const).map((slot) => ({ id: randomUUID(), runId: id, slot, distanceCm, xCm: 0, yCm: 0 })),
            )
          : [];
        await readingsRepo.insertMany(trx, [...points, ...checks]);
        await audit({
          trx,
          clock: deps.clock,
          caller,
          action: 'run.create',
          entity: { type: 'run', id },
          after: { status: 'draft', unitId: body.unitId, instrumentId: body.instrumentId, grid: body.grid, readings: points.length + checks.length },
        });
      });
      return view(deps.db, await load(deps.db, id));
    },

    async update(caller: Caller, id: string, patch: RunPatch): Promise<Run> {
      assertCan(caller, 'runs.upload');
      await deps.db.transaction(async (trx) => {
        await runsRepo.lock(trx, id);
        const run = await load(trx, id);
        if (!runIsEditable(run.status)) throw new AppError('conflict', `A run that is ${run.status.replace('_', ' ')} cannot be changed.`);
        const changes: Record<string, unknown> = {};
        if (patch.measuredOn !== undefined) changes.measured_on = patch.measuredOn;
        if (patch.notes !== undefined) changes.notes = patch.notes;
        if (patch.bands !== undefined) changes.bands = JSON.stringify(patch.bands);
        if (patch.conditions) {
          if (patch.conditions.roomTempC !== undefined) changes.room_temp_c = patch.conditions.roomTempC;
          if (patch.conditions.warmupMinutes !== undefined) changes.warmup_minutes = patch.conditions.warmupMinutes;
          if (patch.conditions.mainsVoltageV !== undefined) changes.mains_voltage_v = patch.conditions.mainsVoltageV;
        }
        await runsRepo.update(trx, id, changes, deps.clock.now());
        await audit({ trx, clock: deps.clock, caller, action: 'run.update', entity: { type: 'run', id }, before: { status: run.status }, after: { status: run.status, ...patch } });
        // New bands change every band figure: recompute them from the stored spectra.
        if (patch.bands) await deps.queue.enqueue(trx, [{ name: 'analyze-run', data: { runId: id }, singletonKey: id }]);
      });
      return view(deps.db, await load(deps.db, id));
    },

    /**
     * One step of the workflow: the capability, the row-level rule (never approve a run one
     * measured), then in one transaction a conditional update from the expected state and an
     * audit row. Two concurrent approvals: the second finds the run no longer submitted (409).
     */
    async transition(caller: Caller, id: string, name: RunTransitionName, note: string | undefined): Promise<Run> {
      const t = RUN_TRANSITIONS[name];
      assertCan(caller, t.capability);
      const user = callerUser(caller);
      if (t.noteRequired && !note?.trim()) throw validationFailed([{ path: 'body.note', message: 'Say what needs changing.' }]);
      await deps.db.transaction(async (trx) => {
        const run = await load(trx, id);
        if (t.notByMeasurer && user && run.measuredById === user.id) {
          throw forbidden('You measured this run: another editor must approve it.');
        }
        if (!canTransition(name, run.status)) {
          throw new AppError('conflict', `This run is ${run.status.replace('_', ' ')}: it cannot be ${name === 'submit' ? 'submitted' : name === 'approve' ? 'approved' : 'sent back'} now.`);
        }
        if (name === 'submit') await assertReadyToSubmit(trx, run);
        const now = deps.clock.now();
        const extra: Record<string, unknown> =
          name === 'submit' ? { submitted_at: now } : { decided_at: now, decided_by: user?.id ?? null };
        const moved = await runsRepo.transition(trx, id, t.from, t.to, extra, now);
        if (!moved) throw new AppError('conflict', 'Someone else changed this run a moment ago. Reload it and try again.');
        await audit({
          trx,
          clock: deps.clock,
          caller,
          action: `run.${name}`,
          entity: { type: 'run', id },
          before: { status: run.status },
          after: { status: t.to, note: note?.trim() || null },
        });
      });
      return view(deps.db, await load(deps.db, id));
    },

    async auditTrail(caller: Caller, id: string): Promise<AuditEvent[]> {
      assertCan(caller, 'lab.enter');
      await load(deps.db, id);
      const rows = await auditRepo.listFor(deps.db, 'run', id);
      return rows.map((r: any) => ({
        at: new Date(r.created_at).toISOString(),
        actor: r.actor_label,
        action: r.action,
        from: r.before?.status ?? null,
        to: r.after?.status ?? null,
        note: r.after?.note ?? r.after?.reason ?? null,
      }));
    },

    async comments(caller: Caller, id: string) {
      assertCan(caller, 'lab.enter');
      await load(deps.db, id);
      return runCommentsRepo.listForRun(deps.db, id);
    },

    async addComment(caller: Caller, id: string, body: { body: string; readingId?: string | null }) {
      assertCan(caller, 'lab.enter');
      if (!can(callerUser(caller)?.role, 'runs.upload') && caller.kind !== 'system') throw forbidden();
      await deps.db.transaction(async (trx) => {
        await load(trx, id);
        if (body.readingId && !(await readingsRepo.findById(trx, id, body.readingId))) {
          throw validationFailed([{ path: 'body.readingId', message: 'No such reading in this run.' }]);
        }
        const commentId = randomUUID();
        await runCommentsRepo.insert(trx, {
          id: commentId,
          runId: id,
          readingId: body.readingId ?? null,
          authorId: callerUser(caller)?.id ?? null,
          authorLabel: callerLabel(caller),
          body: body.body,
          now: deps.clock.now(),
        });
        await audit({ trx, clock: deps.clock, caller, action: 'run.comment', entity: { type: 'run', id }, after: { commentId, readingId: body.readingId ?? null } });
      });
      return runCommentsRepo.listForRun(deps.db, id);
    },
  };
}
export type RunsService = ReturnType<typeof createRunsService>;

/**
 * A run goes to review complete: every grid point has an analysed reading, or is excluded with
 * a written reason. Centre readings for the drift check are optional.
 */
async function assertReadyToSubmit(db: Db, run: RunRecord): Promise<void> {
  const readings = await readingsRepo.listForRun(db, run.id);
  const open = readings.filter((r) => r.slot === 'grid' && r.excludedReason === null && r.analysisOk !== true);
  if (open.length === 0) return;
  const missing = open.filter((r) => r.currentFileId === null).length;
  const failed = open.filter((r) => r.currentFileId !== null && r.analysisOk === false).length;
  const pending = open.length - missing - failed;
  const parts = [
    missing ? `${missing} ${missing === 1 ? 'point has' : 'points have'} no reading` : '',
    failed ? `${failed} ${failed === 1 ? 'reading is' : 'readings are'} in error` : '',
    pending ? `${pending} ${pending === 1 ? 'reading is' : 'readings are'} still being analysed` : '',
  ].filter(Boolean);
  throw new AppError(
    'conflict',
    `The run cannot be submitted yet: ${parts.join(', ')}. Upload them, or exclude a point with a written reason.`,
    { missing, failed, pending },
  );
}
