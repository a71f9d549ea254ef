/**
 * Irradiance of a demo unit at grid points, per emitter type, from the LED-array model: each LED
 * position carries one colour (interleaved) or all colours (multi-chip), with a seeded spread of
 * output between LEDs. The LED intensity is scaled so the centre at 15 cm reads the unit's
 * nominal value.
 */
import {
  lambertianOrderFromFullAngleDeg,
  ledPositionsCm,
  makeArrayIrradianceEvaluator,
  type ReceiverPoint,
} from '#shared/measurement/geometry/led-array.ts';
import { hashSeed, mulberry32, normalFrom } from './prng.ts';
import type { DemoUnit } from './catalog.ts';

export interface UnitIrradiance {
  /** [point][emitter] irradiance, mW/cm². */
  perEmitterMwCm2: number[][];
  /** Sum over emitters per point, mW/cm². */
  totalMwCm2: number[];
  ledCount: number;
}

function geometryOf(unit: DemoUnit) {
  return { widthCm: unit.widthCm, heightCm: unit.heightCm, pitchCm: unit.ledPitchCm };
}

/** Relative weight of each emitter type at each LED, bin spread included: [emitter][led]. */
export function emitterLedWeights(unit: DemoUnit, seed: number): number[][] {
  const leds = ledPositionsCm(geometryOf(unit));
  const nx = Math.max(1, Math.round(unit.widthCm / unit.ledPitchCm));
  const gauss = normalFrom(mulberry32(hashSeed(`${seed}:${unit.id}:leds`)));
  const bins = leds.map(() => Math.max(0.5, 1 + unit.ledBinSpread * gauss()));
  const k = unit.emitters.length;
  // Interleaved: colour index steps along a row and shifts by two per row (a diagonal pattern).
  const colorOf = (i: number) => ((i % nx) + 2 * Math.floor(i / nx)) % k;
  return unit.emitters.map((emitter, e) => {
    if (unit.ledLayout === 'multi-chip') return bins.map((b) => b * emitter.powerFraction);
    const count = leds.filter((_, i) => colorOf(i) === e).length;
    // Fewer LEDs of a colour each run brighter so the colour keeps its share of the power.
    return bins.map((b, i) => (colorOf(i) === e ? (b * emitter.powerFraction * leds.length) / count : 0));
  });
}

export function unitIrradiance(unit: DemoUnit, points: readonly ReceiverPoint[], seed: number): UnitIrradiance {
  const n = lambertianOrderFromFullAngleDeg(unit.modelFullAngleDeg);
  const weights = emitterLedWeights(unit, seed);
  const center: ReceiverPoint = { xCm: 0, yCm: 0, distanceCm: 15 };
  const all = [center, ...points];
  const raw = weights.map((w) => makeArrayIrradianceEvaluator(geometryOf(unit), all, w)(n));
  const centerTotal = raw.reduce((s, r) => s + r[0], 0);
  const scale = unit.centerAt15CmMwCm2 / centerTotal;
  const perEmitterMwCm2 = points.map((_, p) => raw.map((r) => r[p + 1] * scale));
  return {
    perEmitterMwCm2,
    totalMwCm2: perEmitterMwCm2.map((row) => row.reduce((s, v) => s + v, 0)),
    ledCount: weights[0].length,
  };
}
