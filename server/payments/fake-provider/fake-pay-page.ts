/**
 * The fake's hosted payment page: plain HTML that works without script, with the keyboard and
 * a screen reader. It says plainly that it is a local test page and that no money moves; its
 * two buttons only decide how the fake ends this checkout.
 */
import type { SessionRecord } from './fake-state.ts';

export interface PayPageOptions {
  session: SessionRecord;
  /** Shown in an alert above the buttons (after a declined attempt). */
  error?: string;
}

export function payPageHtml({ session: s, error }: PayPageOptions): string {
  const amount = formatMinor(s.amount_total, s.currency);
  const body: string[] = [];
  body.push('<h1>Test payment</h1>');
  body.push(
    '<p class="note"><strong>This is a local test page of Benchlight\'s fake payment provider.</strong> ' +
      'No card is asked for and no money moves: the buttons below only tell the fake how this test payment ends.</p>',
  );
  body.push('<h2>What is being paid</h2>');
  body.push('<dl>');
  body.push(`<dt>Amount</dt><dd>${esc(amount)} <span class="minor">(${s.amount_total} minor units, ${esc(s.currency.toUpperCase())})</span></dd>`);
  body.push(`<dt>For</dt><dd>${esc(s._line_item_name)}</dd>`);
  if (s.customer_email) body.push(`<dt>Payer's e-mail</dt><dd>${esc(s.customer_email)}</dd>`);
  body.push(`<dt>Checkout</dt><dd><code>${esc(s.id)}</code></dd>`);
  body.push('</dl>');

  if (s.status === 'open') {
    if (error) body.push(`<div role="alert" class="error"><p>${esc(error)}</p></div>`);
    body.push('<h2>Choose the outcome</h2>');
    body.push(`<form method="post" action="/pay/${encodeURIComponent(s.id)}/pay" aria-describedby="pay-help">`);
    body.push(`<button type="submit" name="outcome" value="pay">Pay ${esc(amount)}</button>`);
    body.push('<p id="pay-help" class="help">Completes the checkout as paid and returns to the site.</p>');
    body.push('</form>');
    body.push(`<form method="post" action="/pay/${encodeURIComponent(s.id)}/decline" aria-describedby="decline-help">`);
    body.push('<button type="submit" name="outcome" value="decline" class="secondary">Card declined</button>');
    body.push('<p id="decline-help" class="help">Records a declined attempt; nothing is charged and you can try again.</p>');
    body.push('</form>');
    if (s.cancel_url) body.push(`<p><a href="${esc(s.cancel_url)}">Cancel and return to the site</a></p>`);
  } else if (s.status === 'complete') {
    body.push('<p role="status">This checkout is already paid.</p>');
    body.push(`<p><a href="${esc(s.success_url.replaceAll('{CHECKOUT_SESSION_ID}', s.id))}">Return to the site</a></p>`);
  } else {
    body.push('<p role="status">This checkout has expired and can no longer be paid.</p>');
    if (s.cancel_url) body.push(`<p><a href="${esc(s.cancel_url)}">Return to the site</a></p>`);
  }
  return page(`Test payment of ${amount}`, body.join('\n'));
}

export function notFoundPageHtml(): string {
  return page('Checkout not found', '<h1>Checkout not found</h1><p>The local fake payment provider knows no checkout at this address.</p>');
}

export function downPageHtml(): string {
  return page(
    'Payment provider unavailable',
    '<h1>Payment provider unavailable</h1><p>The local fake payment provider is set down for a test. Nothing was done; try again once it is back.</p>',
  );
}

function page(title: string, main: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${esc(title)} · local fake payments</title>
<style>
  body { font: 16px/1.5 system-ui, sans-serif; margin: 0; color: #1d2125; background: #f6f5f1; }
  main { max-width: 34rem; margin: 2rem auto; padding: 1.5rem; background: #fff; border: 1px solid #c9c6bd; }
  .note { padding: .75rem; background: #fff4d6; border: 1px solid #a37b00; }
  .error { padding: .75rem; background: #fde8e6; border: 1px solid #a3261b; }
  dl { display: grid; grid-template-columns: max-content 1fr; gap: .25rem 1rem; }
  dt { font-weight: 600; }
  dd { margin: 0; }
  .minor, .help { color: #4a4f55; font-size: .9rem; }
  form { margin: 1rem 0; }
  button { font: inherit; padding: .5rem 1rem; border: 2px solid #1f4f7a; background: #1f4f7a; color: #fff; cursor: pointer; }
  button.secondary { background: #fff; color: #1f4f7a; }
  button:focus-visible, a:focus-visible { outline: 3px solid #a37b00; outline-offset: 2px; }
  a { color: #1f4f7a; }
</style>
</head>
<body>
<main>
${main}
</main>
</body>
</html>
`;
}

/** Minor units as a price, by string arithmetic (no floating point): 1234 EUR → "€12.34". */
export function formatMinor(amountMinor: number, currency: string): string {
  const code = currency.toUpperCase();
  const format = new Intl.NumberFormat('en-GB', { style: 'currency', currency: code });
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  const sign = amountMinor < 0 ? '-' : '';
  const text = String(Math.abs(amountMinor)).padStart(digits + 1, '0');
  const decimal = digits === 0 ? text : `${text.slice(0, -digits)}.${text.slice(-digits)}`;
  // Intl formats a decimal string exactly (ECMA-402 NumberFormat v3).
  return format.format(`${sign}${decimal}` as Intl.StringNumericLiteral);
}

function esc(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}
