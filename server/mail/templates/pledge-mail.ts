import { formatMinorUnits } from '#shared/money/money.ts';
import { button, escapeHtml, frame, paragraph, type ComposedMail } from './layout.ts';

/**
 * To a backer whose pledge went back: how much, why, and where the money shows. A message about
 * their own money, sent whatever their choices about news (and so without the readers' links).
 */
export function pledgeRefundedMail(i: { device: string; amountMinor: number; currency: string; reason: string | null; requestUrl: string; independenceUrl: string }): ComposedMail {
  const amount = formatMinorUnits(i.amountMinor, i.currency);
  const subject = `Your pledge of ${amount} has been refunded`;
  const why = i.reason ? `Why: ${i.reason}` : 'The test you pledged toward will not take place.';
  const { html, text } = frame({
    title: subject,
    bodyHtml: `<h1 style="margin:0 0 12px;font-size:22px">Your pledge has been refunded</h1>
${paragraph(`You pledged ${amount} toward testing the ${i.device}. We have refunded all of it to the card you paid with.`)}
${paragraph(why)}
${paragraph('Card refunds usually show on a statement within 5 to 10 working days, depending on the bank. Benchlight keeps none of it: the payment provider’s fee is the lab’s cost, not yours.')}
${button(i.requestUrl, 'See the request')}
<p style="margin:0 0 14px">How readers’ money is handled: <a href="${escapeHtml(i.independenceUrl)}">${escapeHtml(i.independenceUrl)}</a></p>`,
    bodyText: `Your pledge has been refunded

You pledged ${amount} toward testing the ${i.device}. We have refunded all of it to the card you paid with.

${why}

Card refunds usually show on a statement within 5 to 10 working days, depending on the bank. Benchlight keeps none of it: the payment provider's fee is the lab's cost, not yours.

The request: ${i.requestUrl}
How readers' money is handled: ${i.independenceUrl}`,
    why: 'You get this because you pledged toward a Benchlight test request with this address.',
  });
  return { subject, html, text };
}
