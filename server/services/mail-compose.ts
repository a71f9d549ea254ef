/**
 * Turns an outbox row into the e-mail to send, at send time: the row holds ids only, so what is
 * mailed is current (a reader who unsubscribed meanwhile gets nothing), and the secret links are
 * minted here — each token is random, stored as its SHA-256 only, and never written in clear
 * anywhere but the message itself.
 */
import { randomUUID } from 'node:crypto';
import { ROLE_LABELS } from '#shared/auth/capabilities.ts';
import { CATEGORY_LABELS } from '#shared/schemas/models.ts';
import type { Topics } from '#shared/schemas/subscriptions.ts';
import type { ReportSnapshot } from '#shared/lab/report-snapshot.ts';
import { newEmailToken, TOKEN_LIFETIME_MS, type EmailTokenPurpose } from '../auth/email-tokens.ts';
import { siteSettings, type ServiceDeps } from '../core/context.ts';
import type { Db } from '../db/knex.ts';
import { emailTokensRepo } from '../db/repos/email-tokens-repo.ts';
import { invitationsRepo } from '../db/repos/invitations-repo.ts';
import { pledgesRepo } from '../db/repos/pledges-repo.ts';
import type { OutboxRecord } from '../db/repos/outbox-repo.ts';
import { reportsRepo } from '../db/repos/reports-repo.ts';
import { subscribersRepo } from '../db/repos/subscribers-repo.ts';
import { testRequestsRepo } from '../db/repos/test-requests-repo.ts';
import { usersRepo } from '../db/repos/users-repo.ts';
import { coveragePng, nearestCoveragePlane } from '../mail/coverage-image.ts';
import type { ComposedMail, ReaderLinks } from '../mail/templates/layout.ts';
import { reportMail } from '../mail/templates/report-mail.ts';
import { requestTestedMail, subscriptionConfirmMail, voteConfirmMail } from '../mail/templates/reader-mail.ts';
import { invitationMail, passwordResetMail } from '../mail/templates/staff-mail.ts';
import { pledgeRefundedMail } from '../mail/templates/pledge-mail.ts';

export type Composition = { mail: ComposedMail } | { cancel: string };

/** "every report", "panels and mats". */
export function topicsText(topics: Topics): string {
  if ('all' in topics) return 'every report';
  const names = topics.categories.map((c) => `${CATEGORY_LABELS[c].toLowerCase()}s`);
  return names.length === 1 ? names[0] : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/** "an editor", "a tester". */
const withArticle = (noun: string) => `${/^[aeiou]/.test(noun) ? 'an' : 'a'} ${noun}`;

const str = (v: unknown): string => (typeof v === 'string' ? v : '');

export function createMailComposer(deps: Pick<ServiceDeps, 'db' | 'clock' | 'site'>) {
  const base = () => siteSettings(deps).publicBaseUrl;

  const mint = async (db: Db, row: OutboxRecord, purpose: EmailTokenPurpose, subject: string, opts: { data?: Record<string, unknown>; expiresAt?: Date } = {}) => {
    const now = deps.clock.now();
    const lifetime = TOKEN_LIFETIME_MS[purpose];
    const expiresAt = opts.expiresAt ?? (lifetime === null ? null : new Date(now.getTime() + lifetime));
    const { token, hash } = newEmailToken();
    await emailTokensRepo.insert(db, { id: randomUUID(), purpose, subject, hash, data: opts.data ?? null, outboxId: row.id, expiresAt, now });
    return token;
  };

  /** Preferences and unsubscribe links for a reader's address (one token for the three). */
  const readerLinks = async (db: Db, row: OutboxRecord): Promise<ReaderLinks> => {
    const token = await mint(db, row, 'reader_manage', row.recipient.toLowerCase());
    const q = `token=${encodeURIComponent(token)}`;
    return {
      preferencesUrl: `${base()}/subscribe/preferences?${q}`,
      unsubscribeUrl: `${base()}/subscribe/unsubscribe?${q}`,
      oneClickUrl: `${base()}/api/public/unsubscribe?${q}`,
    };
  };

  const hours = (ms: number | null) => Math.round((ms ?? 0) / 3_600_000);

  const composers: Record<OutboxRecord['kind'], (db: Db, row: OutboxRecord) => Promise<Composition>> = {
    async subscription_confirm(db, row) {
      const subscriber = await subscribersRepo.findById(db, str(row.payload.subscriberId));
      if (!subscriber) return { cancel: 'The subscriber no longer exists.' };
      const topics = (row.payload.topics as Topics | undefined) ?? subscriber.topics;
      const corrections = typeof row.payload.corrections === 'boolean' ? row.payload.corrections : subscriber.corrections;
      const token = await mint(db, row, 'subscription_confirm', subscriber.id, { data: { topics, corrections } });
      return {
        mail: subscriptionConfirmMail({
          confirmUrl: `${base()}/subscribe/confirm?token=${encodeURIComponent(token)}`,
          topicsText: topicsText(topics),
          corrections,
          expiresHours: hours(TOKEN_LIFETIME_MS.subscription_confirm),
          reader: await readerLinks(db, row),
        }),
      };
    },

    async new_report(db, row) {
      return reportComposition(db, row, 'new_report');
    },
    async report_correction(db, row) {
      return reportComposition(db, row, 'report_correction');
    },

    async vote_confirm(db, row) {
      const vote = await testRequestsRepo.findVote(db, str(row.payload.voteId));
      if (!vote) return { cancel: 'The vote no longer exists.' };
      const request = await testRequestsRepo.findById(db, vote.requestId);
      if (!request) return { cancel: 'The request no longer exists.' };
      const notify = row.payload.notify === true;
      const token = await mint(db, row, 'vote_confirm', vote.id, { data: { notify } });
      return {
        mail: voteConfirmMail({
          confirmUrl: `${base()}/request/confirm?token=${encodeURIComponent(token)}`,
          device: `${request.maker} ${request.model}`,
          newRequest: row.payload.newRequest === true,
          notify,
          expiresHours: hours(TOKEN_LIFETIME_MS.vote_confirm),
          reader: await readerLinks(db, row),
        }),
      };
    },

    async request_tested(db, row) {
      const request = await testRequestsRepo.findById(db, str(row.payload.requestId));
      // A voter, or a backer whose pledge paid toward the test.
      const pledge = row.payload.pledgeId ? await pledgesRepo.find(db, str(row.payload.pledgeId)) : null;
      const vote = pledge ? null : await testRequestsRepo.findVote(db, str(row.payload.voteId));
      if (!request || !(vote || pledge)) return { cancel: 'The request, the vote or the pledge no longer exists.' };
      if (vote && !vote.notify) return { cancel: 'The voter turned these e-mails off before it went out.' };
      if (pledge && !pledge.notify) return { cancel: 'The backer turned these e-mails off before it went out.' };
      if (pledge && pledge.status !== 'paid') return { cancel: 'The pledge was refunded before it went out.' };
      const report = request.reportId ? await reportsRepo.findById(db, request.reportId) : null;
      if (!report || report.status !== 'published') return { cancel: 'The report is not published (any more).' };
      const version = await reportsRepo.version(db, report.id, report.currentVersion);
      return {
        mail: requestTestedMail({
          device: `${request.maker} ${request.model}`,
          as: pledge ? 'backer' : 'voter',
          reportTitle: version?.title ?? report.draftTitle,
          reportUrl: `${base()}/reports/${report.slug}`,
          reader: await readerLinks(db, row),
        }),
      };
    },

    async pledge_refunded(db, row) {
      const pledge = await pledgesRepo.find(db, str(row.payload.pledgeId));
      if (!pledge) return { cancel: 'The pledge no longer exists.' };
      // Sent whatever the reader's mail choices: it is about their money, not news.
      if (pledge.status !== 'refunded') return { cancel: 'The pledge is not refunded (any more).' };
      const request = await testRequestsRepo.findById(db, pledge.requestId);
      return {
        mail: pledgeRefundedMail({
          device: request ? `${request.maker} ${request.model}` : 'the requested device',
          amountMinor: pledge.refundAmountMinor ?? pledge.amountMinor,
          currency: pledge.currency,
          reason: pledge.refundReason,
          requestUrl: `${base()}/requests/${encodeURIComponent(pledge.requestId)}`,
          independenceUrl: `${base()}/independence`,
        }),
      };
    },

    async invitation(db, row) {
      const invitation = await invitationsRepo.find(db, str(row.payload.invitationId));
      if (!invitation || invitation.status !== 'pending') return { cancel: 'The invitation was revoked or used.' };
      const expiresAt = new Date(invitation.expiresAt);
      if (expiresAt <= deps.clock.now()) return { cancel: 'The invitation expired before it could be sent.' };
      const token = await mint(db, row, 'invitation', invitation.id, { expiresAt });
      return {
        mail: invitationMail({
          acceptUrl: `${base()}/lab/welcome?token=${encodeURIComponent(token)}`,
          displayName: invitation.displayName,
          roleLabel: withArticle(ROLE_LABELS[invitation.role].toLowerCase()),
          invitedBy: invitation.invitedBy,
          expiresHours: Math.max(1, Math.round((expiresAt.getTime() - deps.clock.now().getTime()) / 3_600_000)),
        }),
      };
    },

    async password_reset(db, row) {
      const user = await usersRepo.findById(db, str(row.payload.userId));
      if (!user || !user.active) return { cancel: 'The account is gone or deactivated.' };
      const token = await mint(db, row, 'password_reset', user.id);
      return {
        mail: passwordResetMail({
          resetUrl: `${base()}/lab/reset-password?token=${encodeURIComponent(token)}`,
          expiresMinutes: Math.round((TOKEN_LIFETIME_MS.password_reset ?? 0) / 60_000),
        }),
      };
    },
  };

  async function reportComposition(db: Db, row: OutboxRecord, kind: 'new_report' | 'report_correction'): Promise<Composition> {
    const subscriber = await subscribersRepo.findById(db, str(row.payload.subscriberId));
    if (!subscriber || subscriber.status !== 'confirmed') return { cancel: 'The reader unsubscribed before it went out.' };
    const report = await reportsRepo.findById(db, str(row.payload.reportId));
    if (!report || report.status !== 'published') return { cancel: 'The report was retracted before it went out.' };
    const category = await subscribersRepo.reportCategory(db, report.id);
    if (!('all' in subscriber.topics) && !(category && subscriber.topics.categories.includes(category))) {
      return { cancel: 'The reader changed their topics before it went out.' };
    }
    if (kind === 'report_correction' && !subscriber.corrections) return { cancel: 'The reader turned corrections off before it went out.' };
    const versionNumber = Number(row.payload.version);
    const version = await reportsRepo.version(db, report.id, versionNumber);
    if (!version) return { cancel: 'That version of the report does not exist.' };
    const snapshot = version.snapshot as ReportSnapshot;
    const plane = nearestCoveragePlane(snapshot);
    const picture = plane ? coveragePng(plane) : null;
    return {
      mail: reportMail({
        kind,
        title: version.title,
        summary: version.summary,
        makerModel: `${snapshot.model.makerName} ${snapshot.model.name}`,
        version: version.version,
        changeNote: version.changeNote,
        reportUrl: `${base()}/reports/${report.slug}`,
        keyFigures: snapshot.keyFigures,
        coverage: picture && plane ? { png: picture.png, width: picture.width, height: picture.height, distanceCm: plane.distanceCm, peakMwCm2: picture.peak } : null,
        topicsText: topicsText(subscriber.topics),
        reader: await readerLinks(db, row),
      }),
    };
  }

  return {
    /** The e-mail for a claimed row, or why it is no longer to be sent. Tokens are written in `db`. */
    compose(db: Db, row: OutboxRecord): Promise<Composition> {
      return composers[row.kind](db, row);
    },
  };
}
export type MailComposer = ReturnType<typeof createMailComposer>;
