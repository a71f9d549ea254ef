import { describe, expect, it } from 'vitest';
import { cornerViewFactor, panelViewFactor, rectangleViewFactor } from './view-factor.ts';

// Every reference number in this file is computed: from the B-3 formula of Howell's catalogue (with
// the signed split for off-corner receivers), from limiting cases, or by numerically integrating
// the defining integral. None is a value read from a published table.

/** Direct numerical integration of dF = c²·dA / (π r⁴) (definition of the differential-to-finite
 * factor, Siegel & Howell, Thermal Radiation Heat Transfer), midpoint rule. */
function integratedFactor(x0: number, x1: number, y0: number, y1: number, c: number, n = 400): number {
  const dx = (x1 - x0) / n;
  const dy = (y1 - y0) / n;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const x = x0 + (i + 0.5) * dx;
      const y = y0 + (j + 0.5) * dy;
      const r2 = x * x + y * y + c * c;
      sum += (c * c) / (Math.PI * r2 * r2);
    }
  }
  return sum * dx * dy;
}

describe('cornerViewFactor (Howell catalogue case B-3)', () => {
  it('a = b = c gives 0.138532', () => {
    // Computed from the B-3 formula (Howell, A Catalog of Radiation Heat Transfer Configuration Factors, B-3).
    expect(cornerViewFactor(1, 1, 1)).toBeCloseTo(0.138532, 6);
    expect(cornerViewFactor(2.5, 2.5, 2.5)).toBeCloseTo(0.138532, 6);
  });

  it('is symmetric in a and b', () => {
    // Reciprocity of the geometry: swapping the sides changes nothing (Siegel & Howell).
    expect(cornerViewFactor(0.3, 1.7, 0.9)).toBeCloseTo(cornerViewFactor(1.7, 0.3, 0.9), 12);
  });

  it('tends to 1/4 for a quarter of an infinite plane', () => {
    // An infinite plane fills the receiver's hemisphere, F = 1, so one quadrant gives 1/4
    // (Siegel & Howell, Thermal Radiation Heat Transfer, limiting case of B-3).
    expect(cornerViewFactor(1e7, 1e7, 1)).toBeCloseTo(0.25, 6);
  });

  it('agrees with direct numerical integration of the defining integral', () => {
    // Definition dF = cos θ₁ cos θ₂ dA / (π r²) (Siegel & Howell), integrated numerically.
    expect(cornerViewFactor(0.7, 1.3, 0.5)).toBeCloseTo(integratedFactor(0, 0.7, 0, 1.3, 0.5), 5);
  });

  it('rejects a distance of zero', () => {
    expect(() => cornerViewFactor(1, 1, 0)).toThrow(RangeError);
  });
});

describe('panelViewFactor (signed split of B-3)', () => {
  it('centre of a 1 × 1 square at distance 1 gives 0.239456', () => {
    // Computed from Howell B-3 with the four-rectangle split (Siegel & Howell, factor algebra).
    expect(panelViewFactor({ widthCm: 1, heightCm: 1 }, { xCm: 0, yCm: 0, distanceCm: 1 })).toBeCloseTo(0.239456, 6);
  });

  it('centre of a 0.3 × 0.9 m panel at 0.15 / 0.30 / 0.60 m', () => {
    // Computed from Howell B-3 (catalogue case B-3, four-corner split): 0.693784 / 0.408164 / 0.172521.
    const panel = { widthCm: 30, heightCm: 90 };
    expect(panelViewFactor(panel, { xCm: 0, yCm: 0, distanceCm: 15 })).toBeCloseTo(0.693784, 6);
    expect(panelViewFactor(panel, { xCm: 0, yCm: 0, distanceCm: 30 })).toBeCloseTo(0.408164, 6);
    expect(panelViewFactor(panel, { xCm: 0, yCm: 0, distanceCm: 60 })).toBeCloseTo(0.172521, 6);
  });

  it('0.3 × 0.9 m panel at 0.15 m, receiver offset (0.1, 0.3) m gives 0.518558', () => {
    // Computed from Howell B-3 with signed edge offsets (Siegel & Howell, factor algebra).
    expect(panelViewFactor({ widthCm: 30, heightCm: 90 }, { xCm: 10, yCm: 30, distanceCm: 15 })).toBeCloseTo(0.518558, 6);
  });

  it('receiver outside the projection matches direct integration', () => {
    // Definition of the configuration factor (Siegel & Howell), integrated numerically.
    const edges = { x0: 0.4, x1: 1.2, y0: -0.5, y1: 0.3 };
    expect(rectangleViewFactor(edges, 0.6)).toBeCloseTo(integratedFactor(0.4, 1.2, -0.5, 0.3, 0.6), 5);
  });

  it('is additive: two halves add up to the whole', () => {
    // Factor algebra, additivity over a split emitter (Siegel & Howell).
    const whole = rectangleViewFactor({ x0: -0.3, x1: 0.9, y0: -0.2, y1: 0.7 }, 0.4);
    const left = rectangleViewFactor({ x0: -0.3, x1: 0.25, y0: -0.2, y1: 0.7 }, 0.4);
    const right = rectangleViewFactor({ x0: 0.25, x1: 0.9, y0: -0.2, y1: 0.7 }, 0.4);
    expect(left + right).toBeCloseTo(whole, 12);
  });

  it('a very large panel fills the hemisphere (F → 1)', () => {
    // Infinite parallel plane: F = 1 (Siegel & Howell).
    expect(panelViewFactor({ widthCm: 1e8, heightCm: 1e8 }, { xCm: 3, yCm: -2, distanceCm: 10 })).toBeCloseTo(1, 6);
  });
});
