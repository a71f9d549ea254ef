import { describe, expect, it } from 'vitest';
import { fitEffectiveBeamAngle, type ProfileReading } from './beam-angle.ts';
import { ledArrayIrradianceAt } from '../geometry/led-array.ts';
import { mulberry32, normalFrom } from '#seeds/demo/prng.ts';

const emitter = { widthCm: 30, heightCm: 40, pitchCm: 2.5 };

function profiles(fullAngleDeg: number, noise: number, seed: number): ProfileReading[] {
  const points = [];
  for (const distanceCm of [15, 30, 60])
    for (let x = -40; x <= 40; x += 10) for (let y = -20; y <= 20; y += 10) points.push({ xCm: x, yCm: y, distanceCm });
  const e = ledArrayIrradianceAt({ ...emitter, fullAngleDeg, intensityPerLed: 3 }, points);
  const gauss = normalFrom(mulberry32(seed));
  return points.map((p, i) => ({ ...p, irradiance: e[i] * (1 + noise * gauss()) }));
}

describe('fitEffectiveBeamAngle', () => {
  it('recovers the angle of noiseless model profiles', () => {
    // Self-consistency of the cosⁿ array model (computed).
    for (const angle of [30, 60, 120]) {
      const fit = fitEffectiveBeamAngle(emitter, profiles(angle, 0, 1))!;
      expect(fit.fittedFullAngleDeg).toBeCloseTo(angle, 1);
      expect(fit.residualRms).toBeLessThan(1e-4);
      expect(fit.scale).toBeCloseTo(3, 3);
    }
  });

  it('recovers 60° within a few degrees from profiles with 2 % seeded noise', () => {
    // Model profiles with 2 % multiplicative noise (computed).
    for (const seed of [7, 8, 9]) {
      const fit = fitEffectiveBeamAngle(emitter, profiles(60, 0.02, seed))!;
      expect(Math.abs(fit.fittedFullAngleDeg - 60)).toBeLessThan(3);
      expect(fit.residualRms).toBeGreaterThan(0.01);
      expect(fit.residualRms).toBeLessThan(0.03);
    }
  });

  it('reports the claim beside the fit and which reading of it lies nearer', () => {
    const data = profiles(60, 0, 1);
    const asHalf = fitEffectiveBeamAngle(emitter, data, { angleDeg: 30, statesHalfAngle: true })!;
    expect(asHalf.claimedFullAngleDeg).toBe(60);
    expect(asHalf.claimIsHalfAngle).toBe(true);
    expect(asHalf.claimNearerAs).toBe('half');
    const asFull = fitEffectiveBeamAngle(emitter, data, { angleDeg: 60, statesHalfAngle: false })!;
    expect(asFull.claimedFullAngleDeg).toBe(60);
    expect(asFull.claimNearerAs).toBe('full');
    expect(fitEffectiveBeamAngle(emitter, data)!.claimedFullAngleDeg).toBeNull();
  });

  it('ignores non-positive readings and needs at least 3', () => {
    const data = profiles(90, 0, 1).map((r, i) => (i % 2 ? { ...r, irradiance: 0 } : r));
    const fit = fitEffectiveBeamAngle(emitter, data)!;
    expect(fit.readingsUsed).toBe(Math.ceil(data.length / 2));
    expect(fit.fittedFullAngleDeg).toBeCloseTo(90, 1);
    expect(fitEffectiveBeamAngle(emitter, data.slice(0, 4))).toBeNull();
  });
});
