import { describe, expect, it } from 'vitest';
import { integrateTrapezoid, interpolateAt } from './trapezoid.ts';

describe('integrateTrapezoid', () => {
  it('λ = [600, 601, 603, 606, 610], E = 2λ − 1000 → 2100 exactly', () => {
    // Computed: ∫₆₀₀⁶¹⁰ (2λ − 1000) dλ = [λ² − 1000λ] = 2100; the trapezoid rule is exact for linear functions
    const wl = [600, 601, 603, 606, 610];
    expect(integrateTrapezoid(wl, wl.map((l) => 2 * l - 1000), -Infinity, Infinity)).toBe(2100);
  });

  it('interpolates at band edges between samples (exact for linear spectra)', () => {
    // Computed: ∫₆₀₂⁶₀₈ (2λ − 1000) dλ = [λ² − 1000λ]₆₀₂⁶₀₈ = 1260
    const wl = [600, 601, 603, 606, 610];
    expect(integrateTrapezoid(wl, wl.map((l) => 2 * l - 1000), 602, 608)).toBeCloseTo(1260, 10);
    expect(interpolateAt(wl, wl.map((l) => 2 * l - 1000), 604.5)).toBe(209);
  });

  it('clips to the measured range and gives 0 outside it', () => {
    const wl = [600, 610];
    expect(integrateTrapezoid(wl, [1, 1], 500, 605)).toBe(5);
    expect(integrateTrapezoid(wl, [1, 1], 700, 800)).toBe(0);
    expect(integrateTrapezoid([600], [1], 0, 1000)).toBe(0);
  });

  it('tiling bands add up to the whole range', () => {
    // Additivity of the integral over adjacent intervals (any calculus text)
    const wl = Array.from({ length: 300 }, (_, i) => 400 + i * 2.37);
    const e = wl.map((l) => Math.sin(l / 17) + 1.3);
    const whole = integrateTrapezoid(wl, e, -Infinity, Infinity);
    const edges = [wl[0], 455.5, 600, 601.2, 700, 888.8, wl[wl.length - 1]];
    let sum = 0;
    for (let k = 0; k + 1 < edges.length; k++) sum += integrateTrapezoid(wl, e, edges[k], edges[k + 1]);
    expect(Math.abs(sum - whole)).toBeLessThan(1e-12 * whole);
  });

  it('matches the analytic integral of a smooth spectrum on a fine non-uniform grid', () => {
    // Analytic: ∫ (sin(λ/17) + 1.3) dλ = −17 cos(λ/17) + 1.3 λ; trapezoid error O(h²)
    const wl: number[] = [];
    for (let l = 400, k = 0; l <= 1000; l += 0.05 + 0.05 * (k++ % 3)) wl.push(l);
    const e = wl.map((l) => Math.sin(l / 17) + 1.3);
    const F = (l: number) => -17 * Math.cos(l / 17) + 1.3 * l;
    expect(integrateTrapezoid(wl, e, 612.3, 987.6)).toBeCloseTo(F(987.6) - F(612.3), 4);
  });
});
