import { describe, expect, it } from 'vitest';
import { regularizedIncompleteBeta, studentTCoverageFactor, TWO_SIGMA_COVERAGE } from './student-t.ts';

describe('coverage factor from Student\'s t (JCGM 100:2008 G.3–G.4)', () => {
  it('matches JCGM 100:2008 Table G.2 at 95.45 % and 95 %', () => {
    // Table G.2 of JCGM 100:2008, reproduced as NIST TN 1297 Table B.1 (seen), to its printed digits.
    for (const [nu, k] of [
      [1, 13.97],
      [2, 4.53],
      [3, 3.31],
      [4, 2.87],
      [5, 2.65],
      [10, 2.28],
      [19, 2.14],
      [20, 2.13],
      [50, 2.05],
    ]) {
      expect(studentTCoverageFactor(nu)).toBeCloseTo(k, 2);
    }
    expect(studentTCoverageFactor(100)).toBeCloseTo(2.025, 3);
    expect(studentTCoverageFactor(null)).toBe(2);
    expect(studentTCoverageFactor(Infinity)).toBe(2);
    for (const [nu, k] of [
      [1, 12.71],
      [2, 4.3],
      [19, 2.09],
      [100, 1.984],
    ]) {
      expect(studentTCoverageFactor(nu, 0.95)).toBeCloseTo(k, nu === 100 ? 3 : 2);
    }
    expect(studentTCoverageFactor(null, 0.95)).toBeCloseTo(1.96, 2);
  });

  it('agrees with the closed forms for 1 and 2 degrees of freedom', () => {
    // Student's t with ν = 1 (Cauchy): P(|T| ≤ t) = (2/π)·atan t, so t = tan(πp/2); with ν = 2:
    // P(|T| ≤ t) = t/√(2 + t²), so t = p·√(2/(1 − p²)) (closed forms, any statistics handbook).
    const p = TWO_SIGMA_COVERAGE;
    expect(studentTCoverageFactor(1)).toBeCloseTo(Math.tan((Math.PI * p) / 2), 9);
    expect(studentTCoverageFactor(2)).toBeCloseTo(p * Math.sqrt(2 / (1 - p * p)), 9);
    expect(studentTCoverageFactor(2, 0.99)).toBeCloseTo(0.99 * Math.sqrt(2 / (1 - 0.99 ** 2)), 9);
  });

  it('rests on an incomplete beta function with the textbook identities', () => {
    // I_x(a, 1) = x^a, I_x(1, b) = 1 − (1 − x)^b, I_½(a, a) = ½ (Abramowitz & Stegun 26.5, from memory).
    expect(regularizedIncompleteBeta(0.3, 2.5, 1)).toBeCloseTo(0.3 ** 2.5, 12);
    expect(regularizedIncompleteBeta(0.3, 1, 3.5)).toBeCloseTo(1 - 0.7 ** 3.5, 12);
    expect(regularizedIncompleteBeta(0.5, 7.5, 7.5)).toBeCloseTo(0.5, 12);
  });

  it('truncates a non-integer ν to the integer below, but not a whole ν carried in float noise', () => {
    // JCGM 100:2008 G.4.1, Note: t_p for a non-integer ν_eff by interpolation or truncation (from memory).
    expect(studentTCoverageFactor(2.9)).toBe(studentTCoverageFactor(2));
    expect(studentTCoverageFactor(19 - 1e-12)).toBe(studentTCoverageFactor(19));
  });
});
