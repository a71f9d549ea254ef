import { Router } from 'express';
import type { Knex } from 'knex';
import type { HealthResponse } from '../../shared/schemas/health.ts';

/** GET /api/health: 200 when PostgreSQL answers, 503 with db "down" when it does not. */
export function healthRoutes(db: Knex): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    let body: HealthResponse;
    let timer: NodeJS.Timeout | undefined;
    try {
      await Promise.race([
        db.raw('select 1'),
        new Promise((_, reject) => {
          timer = setTimeout(() => reject(new Error('health check timed out')), 3000);
        }),
      ]);
      body = { status: 'ok', db: 'ok' };
    } catch {
      body = { status: 'degraded', db: 'down' };
    } finally {
      clearTimeout(timer);
    }
    res.setHeader('Cache-Control', 'no-store');
    res.status(body.db === 'ok' ? 200 : 503).json(body);
  });
  return router;
}
