import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import type { ReaderPreferences } from '#shared/schemas/subscriptions.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { RequestError } from '#src/components/request-error.tsx';
import { useUpdatePreferences } from '../api/preferences.ts';
import { TopicsFieldset, fromTopics, toTopics, type TopicsValue } from './topics-fieldset.tsx';

const STATUS_TEXT = {
  pending: 'not confirmed yet: nothing is sent until you press the link in the confirmation e-mail',
  confirmed: 'subscribed',
  unsubscribed: 'unsubscribed: nothing is sent',
} as const;

/** A reader's choices for the address the link was mailed to. */
export function PreferencesForm({ token, preferences }: { token: string; preferences: ReaderPreferences }) {
  const update = useUpdatePreferences();
  const sub = preferences.subscription;
  const [topics, setTopics] = useState<TopicsValue>(sub ? fromTopics(sub.topics) : { all: true, categories: [] });
  const [corrections, setCorrections] = useState(sub?.corrections ?? false);
  const [voteNotify, setVoteNotify] = useState(preferences.votes.notify);
  const [topicsError, setTopicsError] = useState<string | undefined>();

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    if (!topics.all && topics.categories.length === 0) {
      setTopicsError('Choose at least one kind of device, or every report.');
      return;
    }
    setTopicsError(undefined);
    update.mutate({ token, ...(sub ? { topics: toTopics(topics), corrections } : {}), ...(preferences.votes.count > 0 ? { voteNotify } : {}) });
  };

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="prefs-heading" className="max-w-measure space-y-6">
      <h2 id="prefs-heading" className="text-xl font-semibold">
        E-mail to {preferences.email}
      </h2>
      {update.isSuccess ? <Alert tone="success">Your choices are saved.</Alert> : null}
      <RequestError error={update.error} />
      {sub ? (
        <>
          <p>
            Report e-mails: <strong>{STATUS_TEXT[sub.status]}</strong>.
            {sub.status === 'unsubscribed' ? (
              <>
                {' '}
                <Link to="/subscribe">Subscribe again</Link>
              </>
            ) : null}
          </p>
          {sub.status !== 'unsubscribed' ? (
            <>
              <TopicsFieldset value={topics} onChange={setTopics} error={topicsError} />
              <label className="flex items-center gap-2 font-sans text-sm">
                <input type="checkbox" checked={corrections} onChange={(e) => setCorrections(e.target.checked)} className="size-4 accent-signal" />
                Also e-mail me when a report is corrected
              </label>
            </>
          ) : null}
        </>
      ) : (
        <p>
          This address does not get report e-mails. <Link to="/subscribe">Subscribe</Link>
        </p>
      )}
      {preferences.votes.count > 0 ? (
        <label className="flex items-center gap-2 font-sans text-sm">
          <input type="checkbox" checked={voteNotify} onChange={(e) => setVoteNotify(e.target.checked)} className="size-4 accent-signal" />
          E-mail me when a device I voted for has been tested ({preferences.votes.count} {preferences.votes.count === 1 ? 'vote' : 'votes'})
        </label>
      ) : null}
      {sub?.status !== 'unsubscribed' || preferences.votes.count > 0 ? (
        <Button type="submit" pending={update.isPending}>
          Save my choices
        </Button>
      ) : null}
    </form>
  );
}
