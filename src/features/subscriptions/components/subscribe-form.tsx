import { useState, type FormEvent } from 'react';
import { subscribeBodySchema } from '#shared/schemas/subscriptions.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { RequestError } from '#src/components/request-error.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { useSubscribe } from '../api/subscribe.ts';
import { TopicsFieldset, toTopics, type TopicsValue } from './topics-fieldset.tsx';

/** The subscribe form: an address, topics, corrections opt-in. Checked by the API's own schema. */
export function SubscribeForm() {
  const subscribe = useSubscribe();
  const [email, setEmail] = useState('');
  const [topics, setTopics] = useState<TopicsValue>({ all: true, categories: [] });
  const [corrections, setCorrections] = useState(false);
  const [errors, setErrors] = useState<{ email?: string; topics?: string }>({});
  const [sentTo, setSentTo] = useState<string | null>(null);

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = subscribeBodySchema.safeParse({ email, topics: toTopics(topics), corrections }, { error: plainIssueMessage });
    if (!parsed.success) {
      const next: typeof errors = {};
      for (const issue of parsed.error.issues) {
        if (issue.path[0] === 'email') next.email ??= issue.message;
        if (issue.path[0] === 'topics') next.topics ??= issue.message;
      }
      setErrors(next);
      return;
    }
    setErrors({});
    subscribe.mutate(parsed.data, { onSuccess: () => setSentTo(parsed.data.email) });
  };

  if (sentTo) {
    return (
      <Alert tone="success" title="Check your e-mail">
        <p>
          If <strong>{sentTo}</strong> can receive e-mail, a message is on its way with a link to confirm. Nothing is sent until you do. The link works for 48 hours.
        </p>
        <p className="mt-2">
          <button type="button" className="underline" onClick={() => setSentTo(null)}>
            Use another address
          </button>
        </p>
      </Alert>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="subscribe-heading" className="max-w-measure space-y-6">
      <h2 id="subscribe-heading" className="text-xl font-semibold">
        Get an e-mail when a report is out
      </h2>
      <RequestError error={subscribe.error} />
      <TextField label="E-mail" type="email" autoComplete="email" spellCheck={false} value={email} onChange={(e) => setEmail(e.target.value)} error={errors.email} />
      <TopicsFieldset value={topics} onChange={setTopics} error={errors.topics} />
      <label className="flex items-start gap-2 font-sans text-sm">
        <input type="checkbox" checked={corrections} onChange={(e) => setCorrections(e.target.checked)} className="mt-0.5 size-4 accent-signal" />
        <span>
          Also e-mail me when a report is corrected
          <span className="block text-xs text-ink-muted">A correction publishes a new version with a note saying what changed.</span>
        </span>
      </label>
      <Button type="submit" pending={subscribe.isPending}>
        Subscribe
      </Button>
      <p className="font-sans text-xs text-ink-muted">
        We send a confirmation first (double opt-in). Every e-mail has a one-click unsubscribe and a link to change these choices. Your address is used for nothing else.
      </p>
    </form>
  );
}
