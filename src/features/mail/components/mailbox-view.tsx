import { useState } from 'react';
import { ErrorState } from '#src/components/error-state.tsx';
import { Spinner } from '#src/components/spinner.tsx';
import { cn } from '#src/lib/cn.ts';
import { formatDate } from '#src/lib/format.ts';
import { useMailbox, useMailboxMessage } from '../api/mailbox.ts';

const SHOWN_HEADERS = ['From', 'To', 'Subject', 'Date', 'Message-ID', 'List-Unsubscribe', 'List-Unsubscribe-Post'];

/** The local fake SMTP server's folder: messages newest first; one opened with its text and HTML. */
export function MailboxView() {
  const list = useMailbox();
  const [openId, setOpenId] = useState<string | null>(null);
  const message = useMailboxMessage(openId);
  if (list.isPending) return <Spinner label="Loading the mailbox…" />;
  if (list.isError) return <ErrorState inline title="The mailbox could not be loaded" error={list.error} onRetry={() => void list.refetch()} />;
  if (list.data.length === 0) return <p className="text-ink-soft">No e-mail yet. Subscribe on the public site, or invite someone, and it appears here.</p>;
  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_3fr]">
      <ul className="max-h-[70vh] space-y-1 overflow-y-auto font-sans text-sm" aria-label="Messages, newest first">
        {list.data.map((m) => (
          <li key={m.id}>
            <button
              type="button"
              onClick={() => setOpenId(m.id)}
              aria-current={openId === m.id ? 'true' : undefined}
              className={cn('w-full rounded border px-3 py-2 text-left', openId === m.id ? 'border-signal bg-signal-tint' : 'border-rule bg-paper-raised hover:bg-paper-sunk')}
            >
              <span className="block font-semibold">{m.subject || '(no subject)'}</span>
              <span className="block text-xs text-ink-muted">
                To {m.to} · {m.date ? formatDate(m.date) : ''}
              </span>
            </button>
          </li>
        ))}
      </ul>
      <section aria-label="The open message" className="min-w-0">
        {openId === null ? (
          <p className="text-ink-soft">Choose a message to read it.</p>
        ) : message.isPending ? (
          <Spinner label="Opening…" />
        ) : message.isError ? (
          <ErrorState inline title="The message could not be opened" error={message.error} onRetry={() => void message.refetch()} />
        ) : (
          <div className="space-y-4">
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 font-sans text-xs">
              {SHOWN_HEADERS.map((name) => {
                const value = message.data.headers.find((h) => h.name.toLowerCase() === name.toLowerCase())?.value;
                return value ? (
                  <div key={name} className="contents">
                    <dt className="font-semibold">{name}</dt>
                    <dd className="break-all">{value}</dd>
                  </div>
                ) : null;
              })}
            </dl>
            {message.data.html ? (
              // No scripts, no same-origin access: the message is shown, never run; its links open in a new tab.
              <iframe
                title={`HTML of “${message.data.subject}”`}
                sandbox="allow-popups allow-popups-to-escape-sandbox"
                srcDoc={`<base target="_blank">${message.data.html}`}
                className="h-[60vh] w-full rounded border border-rule bg-white"
              />
            ) : null}
            {message.data.text ? (
              <details open={!message.data.html}>
                <summary className="cursor-pointer font-sans text-sm font-semibold">Plain-text part</summary>
                <pre className="mt-2 whitespace-pre-wrap break-words rounded border border-rule bg-paper-raised p-3 font-mono text-xs">{message.data.text}</pre>
              </details>
            ) : null}
          </div>
        )}
      </section>
    </div>
  );
}
