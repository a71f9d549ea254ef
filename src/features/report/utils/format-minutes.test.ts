import { describe, expect, it } from 'vitest';
import { formatMinutes, minutesText } from './format-minutes.ts';

describe('minutesText (dose table)', () => {
  it('turns dose times into minutes', () => {
    // H = E·t: 4 J/cm² at 25 mW/cm² takes 160 s (radiant exposure, the definition; worked
    // example in the project's measurement reference) = 2.67 min (computed).
    expect(minutesText(160)).toBe('2.7');
    // 30 J/cm² at 50 mW/cm² takes 600 s = 10 min (same source).
    expect(minutesText(600)).toBe('10');
    // 49.06 s = 0.818 min; 1471.7 s = 24.53 min (computed).
    expect(minutesText(49.057)).toBe('0.8');
    expect(minutesText(1471.72)).toBe('25');
  });

  it('keeps one decimal up to the switch to whole minutes, and groups large numbers', () => {
    expect(minutesText(9.94 * 60)).toBe('9.9');
    expect(minutesText(9.96 * 60)).toBe('10'); // rounds to 10.0: whole minutes
    expect(minutesText(73_800)).toBe('1,230');
  });

  it('says "< 0.1" for a few seconds and "—" when there is no time', () => {
    expect(minutesText(2)).toBe('< 0.1');
    expect(minutesText(null)).toBe('—');
    expect(minutesText(undefined)).toBe('—');
    expect(minutesText(Number.POSITIVE_INFINITY)).toBe('—');
    expect(minutesText(-1)).toBe('—');
  });

  it('adds the unit', () => {
    expect(formatMinutes(160)).toBe('2.7 min');
    expect(formatMinutes(null)).toBe('—');
  });
});
