import { useId, useState, type FormEvent } from 'react';
import { fundingGoal } from '#shared/funding/funding-math.ts';
import { majorToMinor, minorToMajor } from '#shared/money/money.ts';
import type { FundingSettings } from '#shared/schemas/funding.ts';
import type { LabTestRequest } from '#shared/schemas/test-requests.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { SaveError } from '#src/components/save-error.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { formatMoney } from '#src/lib/format.ts';
import { useSetGoal } from '../api/set-goal.ts';

/**
 * An editor's goal for a request: the unit's retail price, typed in; one bench day is added from
 * the lab's settings, and the sum is shown before it is saved.
 */
export function GoalForm({ request, settings }: { request: LabTestRequest; settings: FundingSettings }) {
  const save = useSetGoal();
  const id = useId().replace(/:/g, '');
  const current = request.funding.goal;
  const currency = current?.currency ?? settings.currency;
  const [price, setPrice] = useState(current ? minorToMajor(current.unitPriceMinor, currency) : '');
  const [error, setError] = useState<string | undefined>();
  const device = `${request.maker} ${request.model}`;
  const fundable = request.status === 'open' || request.status === 'planned';

  if (!fundable || request.funding.goalReachedAt) {
    return current ? (
      <p className="font-sans text-sm">
        Goal {formatMoney(current.totalMinor, current.currency)}
        {request.funding.goalReachedAt ? ', reached' : ''}.
      </p>
    ) : null;
  }
  const parsed = price.trim() === '' ? null : majorToMinor(price, currency);
  const preview = parsed?.ok && parsed.minor > 0 ? fundingGoal(parsed.minor, settings.benchDayCostMinor, currency) : null;

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    if (!parsed) return setError('Enter the unit’s retail price.');
    if (!parsed.ok) return setError(parsed.message);
    if (parsed.minor <= 0) return setError('The price must be above zero.');
    setError(undefined);
    save.mutate({ requestId: request.id, body: { unitPriceMinor: parsed.minor } });
  };

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label={`Funding goal for the ${device}`}>
      {save.isSuccess ? <Alert tone="success">Goal saved: readers can pledge toward it now.</Alert> : null}
      <SaveError error={save.error} what="The goal" />
      <TextField
        id={`${id}-price`}
        label={`Unit price (retail, ${currency})`}
        inputMode="decimal"
        autoComplete="off"
        hint="What the unit costs in a shop, as a reader would pay."
        value={price}
        onChange={(e) => setPrice(e.target.value)}
        error={error}
      />
      <p className="font-sans text-sm" aria-live="polite">
        {preview
          ? `${formatMoney(preview.unitPriceMinor, currency)} unit + ${formatMoney(preview.benchDayMinor, currency)} one bench day = ${formatMoney(preview.totalMinor, currency)} goal`
          : `Unit price + ${formatMoney(settings.benchDayCostMinor, currency)} one bench day = goal`}
      </p>
      <Button type="submit" size="sm" pending={save.isPending}>
        {current ? 'Change the goal' : 'Set the goal'}
      </Button>
    </form>
  );
}
