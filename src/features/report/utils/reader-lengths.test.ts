import { describe, expect, it } from 'vitest';
import { withReaderLengths } from './reader-lengths.ts';

// 1 in = 2.54 cm exactly (international yard and pound agreement, 1959); values computed.
const inches = (cm: number) => `${(cm / 2.54).toFixed(1)} in`;

describe('withReaderLengths', () => {
  it('rewrites lengths in cm into the reader unit', () => {
    expect(withReaderLengths('Centre irradiance at 15 cm', inches)).toBe('Centre irradiance at 5.9 in');
    expect(withReaderLengths('50 % spread width at 30 cm', inches)).toBe('50 % spread width at 11.8 in');
    expect(withReaderLengths('from -7.5 cm to 7.5 cm', inches)).toBe('from -3.0 in to 3.0 in');
  });

  it('leaves areas, percentages and other words alone', () => {
    expect(withReaderLengths('2340 cm² at or above 50 % of the peak', inches)).toBe('2340 cm² at or above 50 % of the peak');
    expect(withReaderLengths('Falloff exponent', inches)).toBe('Falloff exponent');
    expect(withReaderLengths('15 cmx', inches)).toBe('15 cmx');
  });
});
