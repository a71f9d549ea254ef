import { createReaderLimiter } from '../auth/reader-limiter.ts';
import { siteSettings, type ServiceDeps } from '../core/context.ts';
import { createAuthService } from './auth-service.ts';
import { createUsersService } from './users-service.ts';
import { createMakersService } from './makers-service.ts';
import { createModelsService } from './models-service.ts';
import { createDeviceUnitsService } from './device-units-service.ts';
import { createInstrumentsService } from './instruments-service.ts';
import { createRunsService } from './runs-service.ts';
import { createReadingsService } from './readings-service.ts';
import { createRunUploadsService } from './run-uploads-service.ts';
import { createRunProcessingService } from './run-processing-service.ts';
import { createReportsService } from './reports-service.ts';
import { createPublicReportsService } from './public-reports-service.ts';
import { createPaymentEventsService, type PaymentEventHandlers } from './payment-events-service.ts';
import { createMailComposer } from './mail-compose.ts';
import { createOutboxService } from './outbox-service.ts';
import { createSubscriptionsService } from './subscriptions-service.ts';
import { createTestRequestsService } from './test-requests-service.ts';
import { createInvitationsService } from './invitations-service.ts';
import { createPasswordResetsService } from './password-resets-service.ts';
import { createMailboxService } from './mailbox-service.ts';
import { createReportMail } from './report-mail.ts';
import { createPledgesService } from './pledges-service.ts';
import { createLedgerService } from './ledger-service.ts';

export interface ServicesOptions {
  /**
   * Handlers for payment-provider events besides the pledges' own (which are always registered);
   * one given here for the same event type replaces the pledges' (tests of the webhook intake).
   */
  paymentEventHandlers?: PaymentEventHandlers;
}

/** Every service, built once from the same collaborators (the web app, scripts and tests share this). */
export function createServices(deps: ServiceDeps, options: ServicesOptions = {}) {
  const site = siteSettings(deps);
  const readerLimiter = createReaderLimiter(deps.db, { perIp: site.readerMaxPerIp, perAddress: site.readerMaxPerAddress });
  const outbox = createOutboxService(deps, createMailComposer(deps));
  const testRequests = createTestRequestsService(deps, outbox, readerLimiter);
  const pledges = createPledgesService(deps, outbox, readerLimiter);
  // Publishing a report records its e-mails in the publication's own transaction.
  const reportMail = createReportMail(outbox, testRequests);
  const publicReports = createPublicReportsService(deps);
  return {
    auth: createAuthService(deps),
    users: createUsersService(deps),
    makers: createMakersService(deps),
    models: createModelsService(deps),
    deviceUnits: createDeviceUnitsService(deps),
    instruments: createInstrumentsService(deps),
    runs: createRunsService(deps),
    readings: createReadingsService(deps),
    runUploads: createRunUploadsService(deps),
    runProcessing: createRunProcessingService(deps),
    reports: createReportsService(deps, { onPublished: reportMail.onPublished, afterPublicChange: () => publicReports.forget() }),
    publicReports,
    paymentEvents: createPaymentEventsService(deps, { handlers: { ...pledges.eventHandlers, ...options.paymentEventHandlers } }),
    pledges,
    ledger: createLedgerService(deps),
    outbox,
    subscriptions: createSubscriptionsService(deps, outbox, readerLimiter),
    testRequests,
    invitations: createInvitationsService(deps, outbox),
    passwordResets: createPasswordResetsService(deps, outbox, readerLimiter),
    mailbox: createMailboxService(deps),
  };
}
export type Services = ReturnType<typeof createServices>;
