import { describe, expect, it } from 'vitest';
import { ringBoundsCm } from '#shared/measurement/plane/polygon.ts';
import { anchorHeightCm, BODY_SIZE_PRESETS, placedOverlay } from './body-placement.ts';

// The outline's proportions are Benchlight's own (shared/measurement/plane/body-outline.ts): the
// torso centre is halfway between the shoulder line (0.80 of height) and the hips (0.53), i.e.
// 0.665 of standing height; the chest zone runs from 0.67 to 0.78. Values below are computed.
describe('body placement', () => {
  const medium = BODY_SIZE_PRESETS.medium;

  it('finds the torso centre and the middle of the chest above the soles', () => {
    expect(anchorHeightCm(medium, 'torso')).toBeCloseTo(0.665 * 172, 6); // 114.38 cm
    expect(anchorHeightCm(medium, 'chest')).toBeCloseTo(0.725 * 172, 6); // 124.70 cm
    expect(anchorHeightCm(BODY_SIZE_PRESETS.large, 'torso')).toBeCloseTo(0.665 * 188, 6);
  });

  it('puts the chosen height of the body on the unit centre', () => {
    const atChest = placedOverlay(medium, anchorHeightCm(medium, 'chest'));
    const chest = ringBoundsCm(atChest.zones.find((z) => z.name === 'chest')!.polygon);
    expect((chest.minY + chest.maxY) / 2).toBeCloseTo(0, 6);
    // The soles then lie 124.70 cm below the unit centre, the top of the head 47.30 cm above it.
    const outline = ringBoundsCm(atChest.outline);
    expect(outline.minY).toBeCloseTo(-0.725 * 172, 6);
    expect(outline.maxY).toBeCloseTo((1 - 0.725) * 172, 6);
    // Centred across: the midline on x = 0, shoulders 21 cm either side.
    expect(outline.minX).toBeCloseTo(-21, 6);
    expect(outline.maxX).toBeCloseTo(21, 6);
  });
});
