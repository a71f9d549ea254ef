/**
 * What a publication mails, recorded inside its transaction (the reports service calls this hook
 * there): one message per confirmed subscriber whose topics match the model's category, for a
 * correction only to those who chose corrections; and, on a first publication, one to each voter
 * who asked to hear about a request marked tested with this report.
 */
import type { Db } from '../db/knex.ts';
import { subscribersRepo } from '../db/repos/subscribers-repo.ts';
import type { OutboxService } from './outbox-service.ts';
import type { TestRequestsService } from './test-requests-service.ts';

export function createReportMail(outbox: OutboxService, testRequests: Pick<TestRequestsService, 'queueForPublishedReport'>) {
  return {
    async onPublished(trx: Db, reportId: string, version: number, kind: 'publish' | 'correct'): Promise<void> {
      const category = await subscribersRepo.reportCategory(trx, reportId);
      if (category) {
        const subscribers = await subscribersRepo.matching(trx, category, { corrections: kind === 'correct' });
        await outbox.record(
          trx,
          subscribers.map((s) => ({
            recipient: s.email,
            purpose: `report:${reportId}:v${version}`,
            kind: kind === 'publish' ? ('new_report' as const) : ('report_correction' as const),
            payload: { reportId, version, subscriberId: s.id },
          })),
        );
      }
      if (kind === 'publish') await testRequests.queueForPublishedReport(trx, reportId);
    },
  };
}
