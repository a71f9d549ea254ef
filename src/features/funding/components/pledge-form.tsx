import { useId, useState, type FormEvent } from 'react';
import { majorToMinor } from '#shared/money/money.ts';
import { PUBLIC_NAME_MAX, pledgeBodySchema, type FundingSettings } from '#shared/schemas/funding.ts';
import { Button } from '#src/components/button.tsx';
import { RequestError } from '#src/components/request-error.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { formatMoney } from '#src/lib/format.ts';
import { plainIssueMessage } from '#src/lib/form-messages.ts';
import { useCreatePledge } from '../api/create-pledge.ts';

type Field = 'amount' | 'email' | 'publicName';

/**
 * A pledge toward one request: the amount in the lab's currency, an address (never shown), and a
 * name to show or none. The server opens the provider's hosted checkout and the page goes there:
 * no card details pass through Benchlight.
 */
export function PledgeForm({ requestId, device, settings, currency }: { requestId: string; device: string; settings: FundingSettings; currency: string }) {
  const create = useCreatePledge();
  const id = useId().replace(/:/g, '');
  const [amount, setAmount] = useState('');
  const [email, setEmail] = useState('');
  const [publicName, setPublicName] = useState('');
  const [notify, setNotify] = useState(true);
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});
  const minimum = formatMoney(settings.pledgeMinMinor, currency);

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    const next: Partial<Record<Field, string>> = {};
    const minor = majorToMinor(amount, currency);
    if (amount.trim() === '') next.amount = 'Enter the amount.';
    else if (!minor.ok) next.amount = minor.message;
    else if (minor.minor < settings.pledgeMinMinor) next.amount = `The smallest pledge is ${minimum}.`;
    const parsed = pledgeBodySchema.safeParse({ amountMinor: minor.ok ? minor.minor : 0, email, publicName, notify }, { error: plainIssueMessage });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const field = issue.path[0] === 'amountMinor' ? 'amount' : (issue.path[0] as Field);
        next[field] ??= issue.message;
      }
    }
    setErrors(next);
    if (Object.keys(next).length > 0 || !parsed.success) return;
    create.mutate(
      { requestId, body: parsed.data },
      {
        // The provider's page takes the payment; it sends the reader back here afterwards.
        onSuccess: ({ checkoutUrl }) => window.location.assign(checkoutUrl),
      },
    );
  };

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby={`${id}-heading`} className="max-w-measure space-y-4 rounded-md border border-rule bg-paper-raised px-5 py-4 shadow-sheet">
      <h2 id={`${id}-heading`} className="text-xl font-semibold">
        Pledge toward testing the {device}
      </h2>
      <RequestError error={create.error} />
      <TextField
        id={`${id}-amount`}
        label={`Amount (${currency})`}
        inputMode="decimal"
        autoComplete="off"
        hint={`At least ${minimum}. Type it as 25 or 25.50.`}
        value={amount}
        onChange={(e) => setAmount(e.target.value)}
        error={errors.amount}
      />
      <TextField
        id={`${id}-email`}
        label="Your e-mail"
        type="email"
        autoComplete="email"
        spellCheck={false}
        hint="For the refund notice if the test does not happen. Never shown."
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        error={errors.email}
      />
      <TextField
        id={`${id}-name`}
        label="Name to show (optional)"
        autoComplete="nickname"
        maxLength={PUBLIC_NAME_MAX}
        hint="Shown among the backers. Leave it empty to pledge anonymously: you are counted, not named."
        value={publicName}
        onChange={(e) => setPublicName(e.target.value)}
        error={errors.publicName}
      />
      <label className="flex items-center gap-2 font-sans text-sm">
        <input type="checkbox" checked={notify} onChange={(e) => setNotify(e.target.checked)} className="size-4 accent-signal" />
        E-mail me when it has been tested
      </label>
      <p className="font-sans text-sm text-ink-soft">
        You pay on the payment provider’s page; your card details never reach Benchlight. If the test does not happen (the request is declined, or not
        tested within {settings.refundAfterDays} days of reaching its goal), your pledge is refunded in full, automatically.
      </p>
      <Button type="submit" pending={create.isPending}>
        Pledge and go to payment
      </Button>
    </form>
  );
}
