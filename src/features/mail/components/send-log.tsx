import { useState } from 'react';
import { MAIL_KIND_LABELS, OUTBOX_STATES, type OutboxState } from '#shared/schemas/mail.ts';
import { Button } from '#src/components/button.tsx';
import { ErrorState } from '#src/components/error-state.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { formatCount } from '#src/lib/format.ts';
import { useOutbox, useResendMail } from '../api/outbox.ts';

const STATE_LABELS: Record<OutboxState, string> = { queued: 'Queued', sending: 'Sending', sent: 'Sent', failed: 'Failed', cancelled: 'Not sent' };
const dateTime = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', second: '2-digit' });
const when = (iso: string | null) => (iso ? dateTime.format(new Date(iso)) : '—');

/** Every e-mail the outbox recorded: to whom, why, its state, attempts and the last error. */
export function SendLog() {
  const [state, setState] = useState<OutboxState | ''>('');
  const [q, setQ] = useState('');
  const [page, setPage] = useState(1);
  const log = useOutbox({ state: state || undefined, q, page });
  const resend = useResendMail();
  if (log.isPending) return <Spinner label="Loading the send log…" />;
  if (log.isError) return <ErrorState inline title="The send log could not be loaded" error={log.error} onRetry={() => void log.refetch()} />;
  const { items, total, counts, pageSize } = log.data;
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <div className="space-y-5">
      <p className="font-sans text-sm">
        {OUTBOX_STATES.map((s) => `${STATE_LABELS[s]}: ${formatCount(counts[s] ?? 0)}`).join(' · ')}
      </p>
      <div className="grid max-w-2xl gap-4 sm:grid-cols-2">
        <SelectField label="State" options={[{ value: '', label: 'Every state' }, ...OUTBOX_STATES.map((s) => ({ value: s, label: STATE_LABELS[s] }))]} value={state} onChange={(e) => { setState(e.target.value as OutboxState | ''); setPage(1); }} />
        <TextField label="Search" type="search" hint="Recipient, subject or purpose." value={q} onChange={(e) => { setQ(e.target.value); setPage(1); }} />
      </div>
      <SaveError error={resend.error} what="Sending again" />
      <div className="overflow-x-auto">
        <table className="w-full border-collapse font-sans text-sm">
          <caption className="sr-only">Send log, newest first</caption>
          <thead>
            <tr className="border-b border-rule text-left align-bottom">
              <th scope="col" className="py-2 pr-3">Recorded</th>
              <th scope="col" className="py-2 pr-3">To</th>
              <th scope="col" className="py-2 pr-3">What</th>
              <th scope="col" className="py-2 pr-3">State</th>
              <th scope="col" className="py-2 pr-3">Attempts</th>
              <th scope="col" className="py-2 pr-3">Sent or last error</th>
              <th scope="col" className="py-2"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {items.map((m) => (
              <tr key={m.id} className="border-b border-rule align-top">
                <td className="py-2 pr-3 whitespace-nowrap">{when(m.createdAt)}</td>
                <td className="py-2 pr-3">{m.recipient}</td>
                <td className="py-2 pr-3">
                  {MAIL_KIND_LABELS[m.kind]}
                  {m.subject ? <span className="block text-xs text-ink-muted">{m.subject}</span> : null}
                </td>
                <td className="py-2 pr-3">{STATE_LABELS[m.state]}</td>
                <td className="py-2 pr-3">{formatCount(m.attempts)}</td>
                <td className="py-2 pr-3">{m.state === 'sent' ? when(m.sentAt) : m.lastError ?? (m.state === 'queued' ? `next try ${when(m.nextAttemptAt)}` : '—')}</td>
                <td className="py-2 text-right">
                  {m.state === 'failed' ? (
                    <Button size="sm" variant="secondary" onClick={() => resend.mutate(m.id)} pending={resend.isPending && resend.variables === m.id} aria-label={`Send again to ${m.recipient}`}>
                      Send again
                    </Button>
                  ) : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {items.length === 0 ? <p className="text-ink-soft">No e-mail here.</p> : null}
      <nav aria-label="Send log pages" className="flex items-center gap-3 font-sans text-sm">
        <Button size="sm" variant="secondary" disabled={page <= 1} onClick={() => setPage(page - 1)}>Newer</Button>
        <span>Page {page} of {pages}</span>
        <Button size="sm" variant="secondary" disabled={page >= pages} onClick={() => setPage(page + 1)}>Older</Button>
      </nav>
    </div>
  );
}
