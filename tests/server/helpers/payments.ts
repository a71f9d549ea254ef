import { randomUUID } from 'node:crypto';
import type { CreateCheckoutInput } from '#server/payments/payment-provider.ts';

/** A checkout as the pledge code will ask for one; each call gets its own idempotency key. */
export function checkoutInput(overrides: Partial<CreateCheckoutInput> = {}): CreateCheckoutInput {
  return {
    amountMinor: 2500,
    currency: 'EUR',
    description: 'Pledge toward testing a fictional panel',
    successUrl: 'http://127.0.0.1:9/pledges/thanks?session={CHECKOUT_SESSION_ID}',
    cancelUrl: 'http://127.0.0.1:9/pledges/cancelled',
    customerEmail: 'reader@example.test',
    metadata: { pledgeId: randomUUID(), kind: 'pledge' },
    idempotencyKey: `checkout-${randomUUID()}`,
    ...overrides,
  };
}

/**
 * Submits one of the hosted page's forms as a browser would: reads the page, takes the form
 * whose action ends in `/pay` or `/decline`, and POSTs it (without following the redirect).
 */
export async function submitHostedPage(pageUrl: string, outcome: 'pay' | 'decline') {
  const page = await fetch(pageUrl);
  const html = await page.text();
  if (page.status !== 200) throw new Error(`the hosted page answered ${page.status}: ${html.slice(0, 200)}`);
  const action = new RegExp(`<form method="post" action="([^"]+/${outcome})"`).exec(html)?.[1];
  if (!action) throw new Error(`the hosted page has no ${outcome} form`);
  const res = await fetch(new URL(action, pageUrl), {
    method: 'POST',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ outcome }).toString(),
    redirect: 'manual',
  });
  return { status: res.status, location: res.headers.get('location'), html: await res.text(), pageHtml: html };
}
