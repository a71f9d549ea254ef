const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

/** "3 Mar 2025"; the ISO string if it cannot be read. */
export function formatDate(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : dateFormat.format(d);
}

/** "1 minute", "5 minutes": rounds up so nobody retries too early. */
export function minutesFromSeconds(seconds: number): string {
  const m = Math.max(1, Math.ceil(seconds / 60));
  return `${m} ${m === 1 ? 'minute' : 'minutes'}`;
}
