import type { Knex } from 'knex';
import { fundingGoal, refundDeadline, summarizeBackers, type Backers } from '#shared/funding/funding-math.ts';
import type { RequestFunding } from '#shared/schemas/funding.ts';
import type { LabTestRequest, PublicTestRequest, TestRequestStatus } from '#shared/schemas/test-requests.ts';
import { iso } from './list-page.ts';
import { pledgesRepo } from './pledges-repo.ts';

export interface TestRequestRecord {
  id: string;
  maker: string;
  model: string;
  status: TestRequestStatus;
  reportId: string | null;
  mergedInto: string | null;
  declineReason: string | null;
  /** The unit's price and the bench day as set by an editor, or null before a goal is set. */
  goal: { unitPriceMinor: number; benchDayMinor: number; currency: string } | null;
  goalReachedAt: Date | null;
}

const toRecord = (r: any): TestRequestRecord => ({
  id: r.id,
  maker: r.maker,
  model: r.model,
  status: r.status,
  reportId: r.report_id,
  mergedInto: r.merged_into,
  declineReason: r.decline_reason,
  goal: r.goal_unit_price_minor === null ? null : { unitPriceMinor: Number(r.goal_unit_price_minor), benchDayMinor: Number(r.goal_bench_day_minor), currency: r.goal_currency },
  goalReachedAt: r.goal_reached_at ? new Date(r.goal_reached_at) : null,
});

/** Requests that take pledges (and votes). */
export const FUNDABLE_STATUSES: readonly TestRequestStatus[] = ['open', 'planned'];

export interface VoteRecord {
  id: string;
  requestId: string;
  email: string;
  status: 'pending' | 'confirmed';
  notify: boolean;
}

const toVote = (r: any): VoteRecord => ({ id: r.id, requestId: r.request_id, email: r.email, status: r.status, notify: r.notify });

/** The request columns with confirmed, pending and notify vote counts and the linked report. */
function listQuery(db: Knex) {
  return db('test_requests as t')
    .leftJoin('reports as r', 'r.id', 't.report_id')
    .leftJoin('users as u', 'u.id', 't.triaged_by')
    .leftJoin('request_funding as f', 'f.request_id', 't.id')
    .select(
      't.*',
      'f.raised_minor',
      'f.backers',
      'f.refunds_under_way',
      'f.pending_pledges',
      'r.slug as report_slug',
      'r.status as report_status',
      db.raw('(select v.title from report_versions v where v.report_id = r.id and v.version = r.current_version) as report_title'),
      'r.draft_title as report_draft_title',
      'u.display_name as triaged_by_name',
      db.raw("(select count(*) from test_request_votes v where v.request_id = t.id and v.status = 'confirmed')::int as votes"),
      db.raw("(select count(*) from test_request_votes v where v.request_id = t.id and v.status = 'pending')::int as pending_votes"),
      db.raw("(select count(*) from test_request_votes v where v.request_id = t.id and v.status = 'confirmed' and v.notify)::int as notify_votes"),
    );
}

function fundingOf(r: any, backers: Backers): RequestFunding {
  const goal = r.goal_unit_price_minor === null ? null : fundingGoal(Number(r.goal_unit_price_minor), Number(r.goal_bench_day_minor), r.goal_currency);
  const reachedAt = r.goal_reached_at ? new Date(r.goal_reached_at) : null;
  return {
    goal,
    raisedMinor: Number(r.raised_minor ?? 0),
    backers: Number(r.backers ?? 0),
    names: backers.names,
    anonymousBackers: backers.anonymous,
    goalReachedAt: reachedAt ? reachedAt.toISOString() : null,
    refundBy: reachedAt ? refundDeadline(reachedAt).toISOString() : null,
    refundsUnderWay: Number(r.refunds_under_way ?? 0),
    open: goal !== null && !reachedAt && FUNDABLE_STATUSES.includes(r.status),
  };
}

/** The named and anonymous backers of each row, from their paid pledges. */
async function backersByRequest(db: Knex, rows: any[]): Promise<Map<string, Backers>> {
  const paid = await pledgesRepo.paidOf(db, rows.filter((r) => Number(r.backers ?? 0) > 0).map((r) => r.id));
  const byRequest = new Map<string, typeof paid>();
  for (const p of paid) byRequest.set(p.requestId, [...(byRequest.get(p.requestId) ?? []), p]);
  return new Map(rows.map((r) => [r.id, summarizeBackers(byRequest.get(r.id) ?? [])]));
}

function toPublic(r: any, backers: Backers): PublicTestRequest {
  return {
    id: r.id,
    maker: r.maker,
    model: r.model,
    link: r.link,
    reason: r.reason,
    status: r.status,
    votes: Number(r.votes),
    declineReason: r.decline_reason,
    // Readers see the report only once it is public.
    report: r.report_slug && r.report_status === 'published' ? { slug: r.report_slug, title: r.report_title ?? r.report_draft_title } : null,
    createdAt: iso(r.created_at)!,
    funding: fundingOf(r, backers),
  };
}

function toLab(r: any, backers: Backers): LabTestRequest {
  return {
    ...toPublic(r, backers),
    report: r.report_slug ? { slug: r.report_slug, title: r.report_title ?? r.report_draft_title } : null,
    pendingVotes: Number(r.pending_votes),
    notifyVotes: Number(r.notify_votes),
    mergedInto: r.merged_into,
    reportId: r.report_id,
    triagedBy: r.triaged_by_name ?? null,
    triagedAt: iso(r.triaged_at),
    updatedAt: iso(r.updated_at)!,
    pendingPledges: Number(r.pending_pledges ?? 0),
  };
}

async function mapRows<T>(db: Knex, rows: any[], map: (r: any, b: Backers) => T): Promise<T[]> {
  const backers = await backersByRequest(db, rows);
  return rows.map((r) => map(r, backers.get(r.id)!));
}

const LISTED: readonly TestRequestStatus[] = ['open', 'planned', 'declined', 'tested'];

export const testRequestsRepo = {
  async insert(db: Knex, r: { id: string; maker: string; model: string; link: string; reason: string; now: Date }): Promise<void> {
    await db('test_requests').insert({ id: r.id, maker: r.maker, model: r.model, link: r.link, reason: r.reason, status: 'unconfirmed', created_at: r.now, updated_at: r.now });
  },

  async findById(db: Knex, id: string, opts: { lock?: boolean } = {}): Promise<TestRequestRecord | null> {
    const q = db('test_requests').where({ id });
    if (opts.lock) q.forUpdate();
    const r = await q.first();
    return r ? toRecord(r) : null;
  },

  /** Listed requests, most votes first, then the oldest. */
  async listPublic(db: Knex): Promise<PublicTestRequest[]> {
    const rows = await listQuery(db).whereIn('t.status', LISTED as TestRequestStatus[]).orderBy([{ column: 'votes', order: 'desc' }, { column: 't.created_at', order: 'asc' }]);
    return mapRows(db, rows, toPublic);
  },

  /** One listed request as readers see it; null for an unconfirmed, merged or unknown one. */
  async publicView(db: Knex, id: string): Promise<PublicTestRequest | null> {
    const r = await listQuery(db).where('t.id', id).whereIn('t.status', LISTED as TestRequestStatus[]).first();
    return r ? (await mapRows(db, [r], toPublic))[0] : null;
  },

  async listLab(db: Knex, status?: TestRequestStatus): Promise<LabTestRequest[]> {
    const q = listQuery(db).orderBy([{ column: 'votes', order: 'desc' }, { column: 't.created_at', order: 'asc' }]);
    if (status) q.where('t.status', status);
    return mapRows(db, await q, toLab);
  },

  async labView(db: Knex, id: string): Promise<LabTestRequest | null> {
    const r = await listQuery(db).where('t.id', id).first();
    return r ? (await mapRows(db, [r], toLab))[0] : null;
  },

  /** An editor's goal: the unit's price and one bench day, in the lab's currency. */
  async setGoal(db: Knex, id: string, g: { unitPriceMinor: number; benchDayMinor: number; currency: string; setBy: string | null }, now: Date): Promise<void> {
    await db('test_requests')
      .where({ id })
      .update({ goal_unit_price_minor: g.unitPriceMinor, goal_bench_day_minor: g.benchDayMinor, goal_currency: g.currency, goal_set_by: g.setBy, goal_set_at: now, updated_at: now });
  },

  /** Records when the goal was reached, once; true when this call recorded it. */
  async markGoalReached(db: Knex, id: string, at: Date): Promise<boolean> {
    const n = await db('test_requests').where({ id }).whereNull('goal_reached_at').whereNotNull('goal_unit_price_minor').update({ goal_reached_at: at, updated_at: at });
    return n > 0;
  },

  /** The money went back: the next time the goal is reached starts a new 180 days. */
  async clearGoalReached(db: Knex, id: string, now: Date): Promise<void> {
    await db('test_requests').where({ id }).whereNotNull('goal_reached_at').update({ goal_reached_at: null, updated_at: now });
  },

  /** Open or planned requests whose goal was reached at or before `reachedBefore` (not tested in time). */
  async lapsed(db: Knex, reachedBefore: Date): Promise<string[]> {
    const rows = await db('test_requests').whereIn('status', FUNDABLE_STATUSES as TestRequestStatus[]).where('goal_reached_at', '<=', reachedBefore).orderBy('goal_reached_at').select('id');
    return rows.map((r) => r.id as string);
  },

  async setStatus(
    db: Knex,
    id: string,
    s: { status: TestRequestStatus; declineReason?: string | null; reportId?: string | null; mergedInto?: string | null; triagedBy?: string | null },
    now: Date,
  ): Promise<void> {
    await db('test_requests')
      .where({ id })
      .update({
        status: s.status,
        decline_reason: s.status === 'declined' ? s.declineReason : null,
        report_id: s.status === 'tested' ? s.reportId : null,
        merged_into: s.status === 'merged' ? s.mergedInto : null,
        ...(s.triagedBy !== undefined ? { triaged_by: s.triagedBy, triaged_at: now } : {}),
        updated_at: now,
      });
  },

  /** The vote of an address on a request, created pending when new; locked until the transaction ends. */
  async upsertVoteLocked(db: Knex, v: { id: string; requestId: string; email: string; now: Date }): Promise<VoteRecord> {
    await db.raw(
      `insert into test_request_votes (id, request_id, email, status, notify, created_at)
       values (?, ?, ?, 'pending', false, ?)
       on conflict (request_id, (lower(email))) do nothing`,
      [v.id, v.requestId, v.email, v.now],
    );
    return toVote(await db('test_request_votes').where({ request_id: v.requestId }).whereRaw('lower(email) = lower(?)', [v.email]).forUpdate().first());
  },

  async findVote(db: Knex, id: string, opts: { lock?: boolean } = {}): Promise<VoteRecord | null> {
    const q = db('test_request_votes').where({ id });
    if (opts.lock) q.forUpdate();
    const r = await q.first();
    return r ? toVote(r) : null;
  },

  async confirmVote(db: Knex, id: string, notify: boolean, now: Date): Promise<void> {
    await db('test_request_votes').where({ id }).update({ status: 'confirmed', notify, confirmed_at: db.raw('coalesce(confirmed_at, ?)', [now]) });
  },

  /** Confirmed voters of a request who asked to hear when it is tested. */
  async notifyVoters(db: Knex, requestId: string): Promise<{ voteId: string; email: string }[]> {
    const rows = await db('test_request_votes').where({ request_id: requestId, status: 'confirmed', notify: true }).orderBy('id').select('id', 'email');
    return rows.map((r) => ({ voteId: r.id, email: r.email }));
  },

  /** Requests marked tested with this report (their voters hear when it is published). */
  async testedWith(db: Knex, reportId: string): Promise<string[]> {
    return (await db('test_requests').where({ report_id: reportId, status: 'tested' }).select('id')).map((r) => r.id as string);
  },

  /**
   * Moves the votes of `fromId` to `intoId`, except those of addresses that already vote there
   * (one vote per address and request); those stay with the merged request.
   */
  async moveVotes(db: Knex, fromId: string, intoId: string): Promise<number> {
    return db('test_request_votes as v')
      .where('v.request_id', fromId)
      .whereNotExists(db('test_request_votes as w').where('w.request_id', intoId).whereRaw('lower(w.email) = lower(v.email)'))
      .update({ request_id: intoId });
  },

  /** Requests merged into this one are pointed at the new target (merges never chain). */
  async repointMerged(db: Knex, fromId: string, intoId: string, now: Date): Promise<void> {
    await db('test_requests').where({ merged_into: fromId }).update({ merged_into: intoId, updated_at: now });
  },

  /** Voting addresses (confirmed) with their notify choice, for the preferences page. */
  async votesOf(db: Knex, email: string): Promise<{ count: number; notify: boolean }> {
    const rows = await db('test_request_votes').whereRaw('lower(email) = lower(?)', [email]).where({ status: 'confirmed' }).select('notify');
    return { count: rows.length, notify: rows.some((r) => r.notify) };
  },

  async setNotifyForAddress(db: Knex, email: string, notify: boolean): Promise<void> {
    await db('test_request_votes').whereRaw('lower(email) = lower(?)', [email]).update({ notify });
  },
};
