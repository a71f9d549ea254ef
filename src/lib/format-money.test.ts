import { describe, expect, it } from 'vitest';
import { formatMoney } from './format.ts';

// Currency symbols and minor digits as Intl (CLDR data) prints them for en-GB.
describe('prices on the page', () => {
  it('shows integer minor units as the major amount with the currency', () => {
    expect(formatMoney(49900, 'EUR')).toBe('€499.00');
    expect(formatMoney(115, 'GBP')).toBe('£1.15');
  });
});
