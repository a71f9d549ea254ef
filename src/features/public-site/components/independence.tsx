import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { fundingGoal } from '#shared/funding/funding-math.ts';
import type { FundingSettings } from '#shared/schemas/funding.ts';
import { formatCount, formatMoney } from '#src/lib/format.ts';

/** A worked example of a goal, in the lab's currency: a unit at 329.00 (an invented shelf price). */
const EXAMPLE_UNIT_MINOR = 32900;

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="max-w-measure space-y-3">
      <h2 id={id} className="text-2xl font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}

/**
 * Who pays for Benchlight's tests and what the lab refuses, in the lab's own words, with the
 * goal's arithmetic from the live settings (left out while they load).
 */
export function IndependenceStatement({ settings }: { settings: FundingSettings | undefined }) {
  const example = settings ? fundingGoal(EXAMPLE_UNIT_MINOR, settings.benchDayCostMinor, settings.currency) : null;
  const money = (minor: number) => (settings ? formatMoney(minor, settings.currency) : '');
  const days = settings?.refundAfterDays ?? 180;
  return (
    <div className="space-y-section">
      <Section id="who-pays" title="Readers pay; makers never do">
        <p>
          Every unit we measure is paid for in one of two ways: by the readers who asked for the test, through pledges toward their request, or by the lab
          out of its own pocket. Makers, sellers and their agents pay us nothing: not for a test, not for a quicker one, and not for kinder wording.
        </p>
        <p>
          Each report says which it was, beside the unit it describes: “Funded by readers” with how many, or “Bought by the lab”.
        </p>
      </Section>

      <Section id="never" title="What we never take from makers or sellers">
        <ul className="list-disc space-y-1 pl-6">
          <li>a unit, whether given, lent or sold to us below the shop price;</li>
          <li>money, gifts, travel or anything else of value, for a test or for leaving one out;</li>
          <li>advertising or sponsorship, on this site or in our e-mails;</li>
          <li>a cut of sales: our links to shops are plain links and earn us nothing;</li>
          <li>a look at a report before readers see it, or any say over when it appears or what it says.</li>
        </ul>
        <p>A maker may write to point out an error after publication, like anyone else; a correction is published as a new version with a note saying what changed.</p>
      </Section>

      <Section id="buying" title="How we buy a unit">
        <p>
          We buy the unit the way you would: from an ordinary shop, at the price on the shelf, without saying that a lab is buying. So the unit on our bench
          is one any reader could have received, not one picked for us.
        </p>
        <p>
          A request’s funding goal is that shelf price plus one day of bench time{settings ? ` (${money(settings.benchDayCostMinor)})` : ''}: the calibrated instruments, the
          tester’s day of measuring and the editor’s review.
        </p>
        {example ? (
          <p className="rounded border-l-4 border-signal bg-signal-tint px-4 py-3 font-sans text-sm">
            For example, a panel on sale at {money(example.unitPriceMinor)}: {money(example.unitPriceMinor)} + {money(example.benchDayMinor)} ={' '}
            <strong>{money(example.totalMinor)}</strong>.
          </p>
        ) : null}
        <p>
          Pledges close once the goal is reached. Two readers paying at the same moment can take the total a little past it; the request page always shows the
          true total, and anything above the goal is spent on the same test.
        </p>
      </Section>

      <Section id="refunds" title="If the test does not happen">
        <p>Your money comes back in full, by itself, to the card it came from, when:</p>
        <ul className="list-disc space-y-1 pl-6">
          <li>an editor declines the request (the reason is shown on it), or</li>
          <li>the unit has not been tested within {formatCount(days)} days of the goal being reached.</li>
        </ul>
        <p>
          You get an e-mail when the refund is made. The payment provider’s fee is the lab’s cost; nothing is kept back from you. Only paid pledges count toward a
          goal: a payment that fails or is abandoned counts for nothing and costs you nothing.
        </p>
      </Section>

      <Section id="payments" title="Your card and your address">
        <p>
          You pay on our payment provider’s own page; your card details never reach Benchlight. We keep your e-mail address to tell you about a refund or, if you
          ask, about the report. It is never shown: backers are listed by the name they choose, or counted without a name.
        </p>
        <p>
          Every payment, refund and fee goes into the lab’s ledger, which is checked against the payment provider’s own records.{' '}
          {settings ? <>The smallest pledge is {money(settings.pledgeMinMinor)}.</> : null}
        </p>
        <p>
          <Link to="/request">Ask for a test, vote or pledge</Link>.
        </p>
      </Section>
    </div>
  );
}
