import type { ServiceDeps } from '../core/context.ts';
import { createAuthService } from './auth-service.ts';
import { createUsersService } from './users-service.ts';

/** Every service, built once from the same collaborators (the web app, scripts and tests share this). */
export function createServices(deps: ServiceDeps) {
  return {
    auth: createAuthService(deps),
    users: createUsersService(deps),
  };
}
export type Services = ReturnType<typeof createServices>;
