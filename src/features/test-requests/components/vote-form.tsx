import { useId, useState, type FormEvent } from 'react';
import { voteBodySchema } from '#shared/schemas/test-requests.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { RequestError } from '#src/components/request-error.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { useVote } from '../api/vote.ts';

/** A vote for one request: an address to confirm it, and whether to hear when it is tested. */
export function VoteForm({ requestId, device }: { requestId: string; device: string }) {
  const vote = useVote();
  const id = useId();
  const [email, setEmail] = useState('');
  const [notify, setNotify] = useState(true);
  const [error, setError] = useState<string | undefined>();
  const [sent, setSent] = useState(false);

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = voteBodySchema.safeParse({ email, notify }, { error: plainIssueMessage });
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message);
      return;
    }
    setError(undefined);
    vote.mutate({ requestId, body: parsed.data }, { onSuccess: () => setSent(true) });
  };

  if (sent) return <Alert tone="success">Check your e-mail: your vote for the {device} counts once you confirm it.</Alert>;
  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Vote for the ${device}`} className="space-y-3 rounded border border-rule bg-paper px-4 py-3">
      <RequestError error={vote.error} />
      <TextField id={`vote-email-${id.replace(/:/g, '')}`} label="Your e-mail" type="email" autoComplete="email" spellCheck={false} value={email} onChange={(e) => setEmail(e.target.value)} error={error} />
      <label className="flex items-center gap-2 font-sans text-sm">
        <input type="checkbox" checked={notify} onChange={(e) => setNotify(e.target.checked)} className="size-4 accent-signal" />
        E-mail me when it has been tested
      </label>
      <Button type="submit" size="sm" pending={vote.isPending}>
        Send my vote
      </Button>
    </form>
  );
}
