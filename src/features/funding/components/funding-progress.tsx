import { Link } from 'react-router-dom';
import { fundingProgress } from '#shared/funding/funding-math.ts';
import type { RequestFunding } from '#shared/schemas/funding.ts';
import { formatCount, formatDate, formatMoney } from '#src/lib/format.ts';

/** "Ada, Bo and 2 anonymous readers". */
function backersText(f: RequestFunding): string {
  const parts = [...f.names];
  if (f.anonymousBackers > 0) parts.push(`${formatCount(f.anonymousBackers)} anonymous ${f.anonymousBackers === 1 ? 'reader' : 'readers'}`);
  return parts.length <= 1 ? (parts[0] ?? '') : `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}`;
}

/** The bar is drawn for the eye only: the sentence beside it says the same in words. */
function Bar({ fraction, reached }: { fraction: number; reached: boolean }) {
  return (
    <div aria-hidden="true" className="h-3 w-full overflow-hidden rounded-sm border border-rule-strong bg-paper-sunk">
      <div className={reached ? 'h-full bg-ok' : 'h-full bg-signal'} style={{ width: `${Math.round(fraction * 1000) / 10}%` }} />
    </div>
  );
}

/**
 * A request's money: raised against the goal (a bar with the figures in words), the goal's
 * arithmetic, who backed it, and what happens to the money when the test does not happen.
 * `compact` is the list's one-line version.
 */
export function FundingProgress({ funding: f, compact = false }: { funding: RequestFunding; compact?: boolean }) {
  if (!f.goal) {
    return compact ? null : (
      <p className="font-sans text-sm text-ink-soft">
        No funding goal yet. When the lab is ready to buy this device, an editor sets one: its retail price plus one day of bench time.
      </p>
    );
  }
  const g = f.goal;
  const p = fundingProgress(f.raisedMinor, g.totalMinor);
  const raised = formatMoney(f.raisedMinor, g.currency);
  const goal = formatMoney(g.totalMinor, g.currency);
  const summary = `${raised} of ${goal} raised (${formatCount(p.percent)} %)`;
  if (compact) {
    return (
      <div className="space-y-1">
        <Bar fraction={p.barFraction} reached={p.reached} />
        <p className="font-sans text-sm">
          {summary} · {formatCount(f.backers)} {f.backers === 1 ? 'backer' : 'backers'}
          {f.goalReachedAt ? ' · goal reached' : ''}
        </p>
      </div>
    );
  }
  return (
    <div className="space-y-3">
      <Bar fraction={p.barFraction} reached={p.reached} />
      <p className="font-sans text-base">
        <strong>{raised}</strong> of {goal} raised ({formatCount(p.percent)} %) from {formatCount(f.backers)} {f.backers === 1 ? 'backer' : 'backers'}
        {p.reached ? '.' : `; ${formatMoney(p.remainingMinor, g.currency)} still needed.`}
      </p>
      <p className="font-sans text-sm text-ink-soft">
        The goal is the unit’s retail price, {formatMoney(g.unitPriceMinor, g.currency)}, plus one day of bench time, {formatMoney(g.benchDayMinor, g.currency)}:{' '}
        {goal}. <Link to="/independence">How we buy units and handle readers’ money</Link>.
      </p>
      {f.goalReachedAt && f.refundBy ? (
        <p className="font-sans text-sm">
          Goal reached on {formatDate(f.goalReachedAt)}. If the unit has not been tested by {formatDate(f.refundBy)}, every pledge is refunded automatically.
        </p>
      ) : null}
      {f.refundsUnderWay > 0 ? (
        <p className="font-sans text-sm">
          Refunds under way: {formatCount(f.refundsUnderWay)} {f.refundsUnderWay === 1 ? 'pledge' : 'pledges'}.
        </p>
      ) : null}
      <p className="font-sans text-sm">{f.backers > 0 ? `Backed by ${backersText(f)}.` : 'No backers yet.'}</p>
    </div>
  );
}
