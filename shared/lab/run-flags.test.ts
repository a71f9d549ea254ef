import { describe, expect, it } from 'vitest';
import { panelViewFactor } from '../measurement/geometry/view-factor.ts';
import { centerDrift, looksSaturated, missingPoints, outlierReadings } from './run-flags.ts';

const panel = { widthCm: 40, heightCm: 30 };
const xs = [-40, -30, -20, -10, 0, 10, 20, 30, 40];
const ys = [-30, -20, -10, 0, 10, 20, 30];
/** Readings of a uniform Lambertian panel (configuration factor, Howell's case B-3) at 20 cm. */
function plane(scale = (_x: number, _y: number) => 1) {
  return ys.flatMap((yCm) => xs.map((xCm) => ({ xCm, yCm, value: 100 * panelViewFactor(panel, { xCm, yCm, distanceCm: 20 }) * scale(xCm, yCm) })));
}
const shape = (xCm: number, yCm: number) => panelViewFactor(panel, { xCm, yCm, distanceCm: 20 });

describe('outlierReadings', () => {
  it('flags nothing in a smooth model field', () => {
    // A noise-free configuration-factor field has no outlier by construction (computed).
    expect(outlierReadings(plane(), { shape })).toEqual([]);
  });

  it('flags exactly the one reading 30 % high, and reports its ratio to the prediction', () => {
    const readings = plane((x, y) => (x === 10 && y === -10 ? 1.3 : 1));
    const found = outlierReadings(readings, { shape });
    expect(found.map((f) => [f.point.xCm, f.point.yCm])).toEqual([[10, -10]]);
    // The ratio is measured against the neighbours' prediction (1.3 exactly: the shape is the field).
    expect(found[0].ratio).toBeCloseTo(1.3, 6);
  });

  it('flags a reading 25 % low among 1 % noise, and none of the noisy others', () => {
    // Deterministic pseudo-noise of ±1 %: well inside 3 robust σ of itself (common practice, no source).
    let k = 1;
    const noise = () => 1 + 0.01 * Math.sin((k += 1.7));
    const readings = plane((x, y) => (x === -20 && y === 10 ? 0.75 : noise()));
    expect(outlierReadings(readings, { shape }).map((f) => [f.point.xCm, f.point.yCm])).toEqual([[-20, 10]]);
  });

  it('judges an edge or a corner from the next two readings inward, and blames the reading, not its neighbours', () => {
    const corner = plane((x, y) => (x === 40 && y === 30 ? 3 : 1));
    expect(outlierReadings(corner, { shape }).map((f) => [f.point.xCm, f.point.yCm])).toEqual([[40, 30]]);
  });

  it('does not judge from neighbours spread wider than maxSpanCm, nor readings near zero', () => {
    const wide = plane((x, y) => (x === 0 && y === 0 ? 1.5 : 1));
    expect(outlierReadings(wide, { shape, maxSpanCm: 15 })).toEqual([]);
    const faint = plane((x, y) => (x === 0 && y === 0 ? 1.5 : 1)).map((p) => ({ ...p, value: p.xCm === 0 && p.yCm === 0 ? 0.001 : p.value }));
    expect(outlierReadings(faint, { shape })).toEqual([]);
  });
});

describe('centerDrift', () => {
  it('is |last / first − 1|, null without both readings', () => {
    expect(centerDrift(100, 106)).toBeCloseTo(0.06, 12);
    expect(centerDrift(100, 95)).toBeCloseTo(0.05, 12);
    expect(centerDrift(null, 95)).toBeNull();
    expect(centerDrift(0, 95)).toBeNull();
  });
});

describe('looksSaturated', () => {
  const wl = Array.from({ length: 801 }, (_, i) => 500 + i * 0.5);
  const gauss = (peak: number, fwhm: number) => wl.map((l) => Math.exp((-4 * Math.LN2 * (l - peak) ** 2) / fwhm ** 2));
  it('flags a line clipped at full scale', () => {
    const clipped = gauss(660, 20).map((v) => Math.min(v, 0.9));
    expect(looksSaturated(wl, clipped)).toBe(true);
  });
  it('passes a smooth 40 nm line: within 0.05 % of its peak over 1.1 nm only (computed)', () => {
    expect(looksSaturated(wl, gauss(850, 40))).toBe(false);
  });
  it('passes a weak line whose equal top values are the export rounding', () => {
    const rounded = gauss(660, 20).map((v) => Math.round(v * 0.02 * 1000) / 1000);
    expect(looksSaturated(wl, rounded)).toBe(false);
  });
});

describe('missingPoints', () => {
  it('lists the expected points without a reading', () => {
    const expected = [{ distanceCm: 15, xCm: 0, yCm: 0 }, { distanceCm: 15, xCm: 10, yCm: 0 }];
    expect(missingPoints(expected, [{ distanceCm: 15, xCm: 0, yCm: 0 }])).toEqual([{ distanceCm: 15, xCm: 10, yCm: 0 }]);
  });
});
