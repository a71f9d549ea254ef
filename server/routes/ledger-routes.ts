import { Router } from 'express';
import { ledgerQuerySchema } from '#shared/schemas/funding.ts';
import { requireCapability } from '../http/require-capability.ts';
import { parseWith } from '../http/validate.ts';
import type { Services } from '../services/index.ts';

/** The ledger of readers' money (admins): the entries and totals, the CSV, the reconciliation. */
export function ledgerRoutes(s: Pick<Services, 'ledger'>): Router {
  const router = Router();
  const read = requireCapability('ledger.read');

  router.get('/lab/ledger', read, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await s.ledger.get(req.caller, parseWith(ledgerQuerySchema, req.query, 'query')));
  });
  router.get('/lab/ledger.csv', read, async (req, res) => {
    const query = parseWith(ledgerQuerySchema, req.query, 'query');
    const csv = await s.ledger.csv(req.caller, query);
    res.setHeader('Cache-Control', 'no-store');
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="benchlight-ledger${query.month ? `-${query.month}` : ''}.csv"`);
    res.send(csv);
  });
  router.get('/lab/ledger/reconciliation', read, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await s.ledger.reconciliation(req.caller, parseWith(ledgerQuerySchema, req.query, 'query')));
  });
  return router;
}
