/** True for errors meaning PostgreSQL cannot be reached (refused, shutting down, pool timeout). */
export function isDatabaseUnavailable(err: unknown): boolean {
  if (!err || typeof err !== 'object') return false;
  const e = err as { code?: string; name?: string; message?: string };
  if (e.code && ['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', '57P01', '57P02', '57P03', '08006', '08001', '08003'].includes(e.code)) {
    return true;
  }
  if (e.name === 'KnexTimeoutError') return true;
  return /Connection terminated|connect ECONNREFUSED|timeout exceeded when trying to connect/i.test(e.message ?? '');
}
