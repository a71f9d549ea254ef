/**
 * Readers' test requests and votes, and the editors' triage. A request is listed once its first
 * vote — the requester's — is confirmed by e-mail; every vote counts once confirmed, one per
 * address and request. Voters who chose so hear, through the outbox, when the report is out.
 */
import { randomUUID } from 'node:crypto';
import type { CreateTestRequestBody, LabTestRequest, PublicTestRequest, TestRequestStatus, TriageBody, VoteBody } from '#shared/schemas/test-requests.ts';
import { createTestRequestBodySchema, voteBodySchema } from '#shared/schemas/test-requests.ts';
import type { ReaderLimiter } from '../auth/reader-limiter.ts';
import { AppError, notFound, validationFailed } from '../core/app-error.ts';
import { callerUser, type Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import type { Db } from '../db/knex.ts';
import { pledgesRepo } from '../db/repos/pledges-repo.ts';
import { reportsRepo } from '../db/repos/reports-repo.ts';
import { testRequestsRepo } from '../db/repos/test-requests-repo.ts';
import { audit } from './audit.ts';
import { useEmailToken } from './email-token-check.ts';
import { refundRequest } from './funding-steps.ts';
import type { OutboxService } from './outbox-service.ts';
import { assertCan } from './permissions.ts';
import { takeReaderLimit } from './subscriptions-service.ts';

const VOTABLE: readonly TestRequestStatus[] = ['open', 'planned'];

export function createTestRequestsService(deps: Pick<ServiceDeps, 'db' | 'clock' | 'queue'>, outbox: OutboxService, limiter: ReaderLimiter) {
  const voteMail = (email: string, voteId: string, notify: boolean, newRequest: boolean) => ({
    recipient: email,
    purpose: `vote-confirm:${voteId}:${randomUUID()}`,
    kind: 'vote_confirm' as const,
    payload: { voteId, notify, newRequest },
  });

  /**
   * One e-mail per voter and backer who asked, once per request and address (a second "tested"
   * records nothing new; a reader who voted and pledged gets one).
   */
  const queueTestedMail = async (trx: Db, requestId: string) => {
    const voters = await testRequestsRepo.notifyVoters(trx, requestId);
    const known = new Set(voters.map((v) => v.email.toLowerCase()));
    const backers = (await pledgesRepo.notifyPledgers(trx, requestId)).filter((p) => !known.has(p.email.toLowerCase()));
    const purpose = `request-tested:${requestId}`;
    return outbox.record(trx, [
      ...voters.map((v) => ({ recipient: v.email, purpose, kind: 'request_tested' as const, payload: { requestId, voteId: v.voteId } })),
      ...backers.map((p) => ({ recipient: p.email, purpose, kind: 'request_tested' as const, payload: { requestId, pledgeId: p.pledgeId } })),
    ]);
  };

  const labView = async (db: Db, id: string): Promise<LabTestRequest> => {
    const found = await testRequestsRepo.labView(db, id);
    if (!found) throw notFound('That request');
    return found;
  };

  return {
    async listPublic(): Promise<PublicTestRequest[]> {
      return testRequestsRepo.listPublic(deps.db);
    },

    /** One listed request with its funding, for its own page. */
    async getPublic(id: string): Promise<PublicTestRequest> {
      const found = await testRequestsRepo.publicView(deps.db, id);
      if (!found) throw notFound('That request');
      return found;
    },

    /** A new request waits for its requester's confirmation before it is listed. Same answer always. */
    async create(caller: Caller, input: CreateTestRequestBody): Promise<void> {
      const body = createTestRequestBodySchema.parse(input);
      if (!(await takeReaderLimit(limiter, caller, body.email))) return;
      await deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        const id = randomUUID();
        await testRequestsRepo.insert(trx, { id, maker: body.maker, model: body.model, link: body.link, reason: body.reason, now });
        const vote = await testRequestsRepo.upsertVoteLocked(trx, { id: randomUUID(), requestId: id, email: body.email, now });
        await outbox.record(trx, [voteMail(body.email, vote.id, body.notify, true)]);
        await audit({ trx, clock: deps.clock, caller, action: 'test_request.create', entity: { type: 'test_request', id }, after: { maker: body.maker, model: body.model, status: 'unconfirmed' } });
      });
    },

    /** A vote for an open or planned request, counted once its confirmation comes back. */
    async vote(caller: Caller, requestId: string, input: VoteBody): Promise<void> {
      const body = voteBodySchema.parse(input);
      const request = await testRequestsRepo.findById(deps.db, requestId);
      if (!request || request.status === 'unconfirmed') throw notFound('That request');
      if (!VOTABLE.includes(request.status)) {
        throw new AppError('conflict', request.status === 'merged' ? 'This request was merged into another; vote there.' : `This request is ${request.status}: votes are closed.`);
      }
      if (!(await takeReaderLimit(limiter, caller, body.email))) return;
      await deps.db.transaction(async (trx) => {
        const vote = await testRequestsRepo.upsertVoteLocked(trx, { id: randomUUID(), requestId, email: body.email, now: deps.clock.now() });
        await outbox.record(trx, [voteMail(body.email, vote.id, body.notify, false)]);
      });
    },

    /** Confirms a vote from its e-mailed link (POST only); a request's first vote lists it. */
    async confirmVote(caller: Caller, token: string): Promise<{ requestId: string }> {
      return deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        const used = await useEmailToken(trx, 'vote_confirm', token, now);
        const vote = await testRequestsRepo.findVote(trx, used.subject, { lock: true });
        if (!vote) throw notFound('That vote');
        await testRequestsRepo.confirmVote(trx, vote.id, (used.data as { notify?: boolean } | null)?.notify === true, now);
        const request = await testRequestsRepo.findById(trx, vote.requestId, { lock: true });
        if (request?.status === 'unconfirmed') await testRequestsRepo.setStatus(trx, request.id, { status: 'open' }, now);
        await audit({ trx, clock: deps.clock, caller, action: 'test_request.vote', entity: { type: 'test_request', id: vote.requestId }, after: { vote: vote.id, status: 'confirmed' } });
        return { requestId: request?.mergedInto ?? vote.requestId };
      });
    },

    async listLab(caller: Caller, status?: TestRequestStatus): Promise<LabTestRequest[]> {
      assertCan(caller, 'requests.triage');
      return testRequestsRepo.listLab(deps.db, status);
    },

    /** Planned, declined (with the reason readers see), tested (with the report), or open again. */
    async triage(caller: Caller, id: string, body: TriageBody): Promise<LabTestRequest> {
      assertCan(caller, 'requests.triage');
      await deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        const before = await testRequestsRepo.findById(trx, id, { lock: true });
        if (!before || before.status === 'unconfirmed') throw notFound('That request');
        if (before.status === 'merged') throw new AppError('conflict', 'A merged request is triaged through the request it was merged into.');
        let reportId: string | null = null;
        if (body.status === 'tested') {
          const report = await reportsRepo.findById(trx, body.reportId);
          if (!report) throw validationFailed([{ path: 'body.reportId', message: 'No such report.' }]);
          if (report.status === 'retracted') throw validationFailed([{ path: 'body.reportId', message: 'That report is retracted.' }]);
          reportId = report.id;
        }
        await testRequestsRepo.setStatus(
          trx,
          id,
          { status: body.status, declineReason: body.status === 'declined' ? body.reason : null, reportId, triagedBy: callerUser(caller)?.id ?? null },
          now,
        );
        // Declining gives every paid pledge back (one refund job each, in this transaction).
        const refunds = body.status === 'declined' && before.status !== 'declined' ? await refundRequest(deps, trx, caller, id, `Declined: ${body.reason}`) : 0;
        // Voters hear now if the report is out, else when it is published (the reports hook).
        let queued = 0;
        if (reportId && (await reportsRepo.findById(trx, reportId))?.status === 'published') queued = await queueTestedMail(trx, id);
        await audit({
          trx,
          clock: deps.clock,
          caller,
          action: 'test_request.triage',
          entity: { type: 'test_request', id },
          before: { status: before.status },
          after: { status: body.status, ...(body.status === 'declined' ? { reason: body.reason, refundsQueued: refunds } : {}), ...(reportId ? { reportId, votersNotified: queued } : {}) },
        });
      });
      return labView(deps.db, id);
    },

    /** Merges a near-duplicate into the request kept: votes move (one per address), the duplicate is hidden. */
    async merge(caller: Caller, id: string, intoId: string): Promise<LabTestRequest> {
      assertCan(caller, 'requests.triage');
      if (id === intoId) throw validationFailed([{ path: 'body.intoId', message: 'Choose another request to merge into.' }]);
      await deps.db.transaction(async (trx) => {
        const now = deps.clock.now();
        // Lock both in id order, so two opposite merges cannot deadlock.
        const [a, b] = [id, intoId].sort();
        await testRequestsRepo.findById(trx, a, { lock: true });
        await testRequestsRepo.findById(trx, b, { lock: true });
        const from = await testRequestsRepo.findById(trx, id);
        const into = await testRequestsRepo.findById(trx, intoId);
        if (!from || from.status === 'unconfirmed') throw notFound('That request');
        if (!into || into.status === 'unconfirmed') throw validationFailed([{ path: 'body.intoId', message: 'No such request.' }]);
        if (from.status === 'merged') throw new AppError('conflict', 'This request is merged already.');
        // Pledges stay with the request readers paid toward: decline it (which refunds them) instead.
        if ((await pledgesRepo.countLive(trx, id)) > 0) throw new AppError('conflict', 'This request has pledges; it cannot be merged away. Decline it instead: its pledges are then refunded.');
        if (into.status === 'merged') throw validationFailed([{ path: 'body.intoId', message: 'That request was itself merged; choose the one it was merged into.' }]);
        const moved = await testRequestsRepo.moveVotes(trx, id, intoId);
        await testRequestsRepo.repointMerged(trx, id, intoId, now);
        await testRequestsRepo.setStatus(trx, id, { status: 'merged', mergedInto: intoId, triagedBy: callerUser(caller)?.id ?? null }, now);
        await audit({ trx, clock: deps.clock, caller, action: 'test_request.merge', entity: { type: 'test_request', id }, before: { status: from.status }, after: { status: 'merged', mergedInto: intoId, votesMoved: moved } });
      });
      return labView(deps.db, intoId);
    },

    /** For the reports hook: the voters of requests tested with a report just published. */
    async queueForPublishedReport(trx: Db, reportId: string): Promise<number> {
      let n = 0;
      for (const requestId of await testRequestsRepo.testedWith(trx, reportId)) n += await queueTestedMail(trx, requestId);
      return n;
    },
  };
}
export type TestRequestsService = ReturnType<typeof createTestRequestsService>;
