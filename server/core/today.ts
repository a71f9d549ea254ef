import type { Clock } from './context.ts';

/** The calendar day of the clock's now, YYYY-MM-DD (UTC), for comparing with DATE columns. */
export function today(clock: Clock): string {
  return clock.now().toISOString().slice(0, 10);
}
