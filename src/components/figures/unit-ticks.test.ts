import { describe, expect, it } from 'vitest';
import { lengthTicks } from './unit-ticks.ts';

describe('lengthTicks', () => {
  it('gives round centimetres when the reader reads cm', () => {
    expect(lengthTicks(-100, 100, 'cm', 8)).toEqual(
      [-100, -75, -50, -25, 0, 25, 50, 75, 100].map((cm) => ({ cm, label: String(cm) })),
    );
  });

  it('gives round inches, placed at 2.54 cm per inch (exact by definition, 1959 agreement)', () => {
    const ticks = lengthTicks(-30, 30, 'in', 6);
    // 30 cm = 11.81 in: ticks every 5 in from -10 to 10 (computed).
    expect(ticks.map((t) => t.label)).toEqual(['-10', '-5', '0', '5', '10']);
    expect(ticks.map((t) => t.cm)).toEqual([-25.4, -12.7, 0, 12.7, 25.4]);
  });
});
