import { Router } from 'express';
import type { HealthResponse } from '#shared/schemas/health.ts';

/** GET /api/health: 200 when PostgreSQL answers, 503 with db "down" when it does not. */
export function healthRoutes(pingDatabase: () => Promise<void>): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    let body: HealthResponse;
    try {
      await pingDatabase();
      body = { status: 'ok', db: 'ok' };
    } catch {
      body = { status: 'degraded', db: 'down' };
    }
    res.setHeader('Cache-Control', 'no-store');
    res.status(body.db === 'ok' ? 200 : 503).json(body);
  });
  return router;
}
