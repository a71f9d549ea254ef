import type { ServiceDeps } from '../core/context.ts';
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

export interface ServicesOptions {
  /** What to do with each kind of payment-provider event (none yet: events are only stored). */
  paymentEventHandlers?: PaymentEventHandlers;
}

/** Every service, built once from the same collaborators (the web app, scripts and tests share this). */
export function createServices(deps: ServiceDeps, options: ServicesOptions = {}) {
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
    reports: createReportsService(deps, { afterPublicChange: () => publicReports.forget() }),
    publicReports,
    paymentEvents: createPaymentEventsService(deps, { handlers: options.paymentEventHandlers }),
  };
}
export type Services = ReturnType<typeof createServices>;
