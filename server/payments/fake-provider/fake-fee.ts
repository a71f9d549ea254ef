/**
 * The fake's own fee rule — not any real provider's price list: 1.5 % of the charged amount,
 * rounded half up to a whole minor unit, plus 25 minor units. Integers throughout.
 * A refund returns no fee (also the fake's rule): the charge's fee stays spent.
 */
export function fakeChargeFee(amountMinor: number): number {
  // 1.5 % = 15/1000; adding 500 before the integer division rounds half up.
  return Math.floor((amountMinor * 15 + 500) / 1000) + 25;
}

export const FAKE_FEE_RULE = '1.5 % of the amount, rounded half up, plus 25 minor units; refunds return no fee';
