/**
 * LED-array emission model. Each LED emits I(θ) = I₀·cosⁿθ (generalised Lambertian emitter);
 * the LEDs sit on a square pitch filling a rectangular emitting area centred on the origin,
 * x along the width, y along the height. The receiver is a small plane parallel to the array
 * at distance d, so each LED adds I(θ)·cosθ / r² (the emission and incidence angles are equal).
 * Lengths in cm; irradiance comes out in (unit of I₀)/cm², e.g. mW/sr → mW/cm².
 */

const DEG = Math.PI / 180;

/**
 * Lambertian order n of a cosⁿ emitter from its full angle at half intensity:
 * n = −ln 2 / ln cos(θ½), θ½ = fullAngle / 2. 120° gives 1 (Lambertian).
 */
export function lambertianOrderFromFullAngleDeg(fullAngleDeg: number): number {
  if (!(fullAngleDeg > 0 && fullAngleDeg < 180)) {
    throw new RangeError(`full angle must lie strictly between 0° and 180°, got ${fullAngleDeg}`);
  }
  return -Math.LN2 / Math.log(Math.cos((fullAngleDeg / 2) * DEG));
}

/** Inverse of lambertianOrderFromFullAngleDeg: full angle at half intensity, degrees. */
export function fullAngleDegFromLambertianOrder(n: number): number {
  if (!(n > 0)) throw new RangeError(`Lambertian order must be positive, got ${n}`);
  return (2 * Math.acos(Math.pow(0.5, 1 / n))) / DEG;
}

export interface LedArrayGeometry {
  /** Emitting area along x, cm. */
  widthCm: number;
  /** Emitting area along y, cm. */
  heightCm: number;
  /** Centre-to-centre LED spacing, same in x and y, cm. */
  pitchCm: number;
}

export interface LedPosition {
  xCm: number;
  yCm: number;
}

export interface ReceiverPoint {
  xCm: number;
  yCm: number;
  distanceCm: number;
}

function checkGeometry(g: LedArrayGeometry): void {
  if (!(g.widthCm >= 0 && g.heightCm >= 0 && g.pitchCm > 0)) {
    throw new RangeError('LED array needs width, height ≥ 0 and pitch > 0 (cm)');
  }
}

/** Number of LEDs along one side: at least one, cells of one pitch filling the side. */
function countAlong(sideCm: number, pitchCm: number): number {
  return Math.max(1, Math.round(sideCm / pitchCm));
}

/** LED centres, row by row (y outer, x inner), centred on the origin. */
export function ledPositionsCm(geometry: LedArrayGeometry): LedPosition[] {
  checkGeometry(geometry);
  const nx = countAlong(geometry.widthCm, geometry.pitchCm);
  const ny = countAlong(geometry.heightCm, geometry.pitchCm);
  const out: LedPosition[] = [];
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      out.push({
        xCm: (i - (nx - 1) / 2) * geometry.pitchCm,
        yCm: (j - (ny - 1) / 2) * geometry.pitchCm,
      });
    }
  }
  return out;
}

export interface LedArray extends LedArrayGeometry {
  /** Full angle at half intensity of each LED, degrees. */
  fullAngleDeg: number;
  /** On-axis intensity I₀ of one LED (any unit per sr, e.g. mW/sr). Default 1. */
  intensityPerLed?: number;
  /** Optional per-LED multipliers (bin spread, dead LEDs), in ledPositionsCm order. */
  ledWeights?: readonly number[];
}

/**
 * Precomputes the geometry between every LED and every receiver point so that many emission
 * angles can be tried cheaply (the beam-angle fit). The returned function gives, for a
 * Lambertian order n, the irradiance at each point per unit on-axis LED intensity (1/cm²).
 */
export function makeArrayIrradianceEvaluator(
  geometry: LedArrayGeometry,
  points: readonly ReceiverPoint[],
  ledWeights?: readonly number[],
): (lambertianOrder: number) => Float64Array {
  const leds = ledPositionsCm(geometry);
  if (ledWeights && ledWeights.length !== leds.length) {
    throw new RangeError(`ledWeights has ${ledWeights.length} entries for ${leds.length} LEDs`);
  }
  const nLed = leds.length;
  // ln cosθ and ln(w/r²) per (point, LED): E = Σ exp((n+1)·ln cosθ + ln(w/r²)).
  const lnCos = new Float64Array(points.length * nLed);
  const lnBase = new Float64Array(points.length * nLed);
  points.forEach((p, k) => {
    if (!(p.distanceCm > 0)) throw new RangeError(`receiver distance must be > 0 cm, got ${p.distanceCm}`);
    const d2 = p.distanceCm * p.distanceCm;
    for (let i = 0; i < nLed; i++) {
      const dx = p.xCm - leds[i].xCm;
      const dy = p.yCm - leds[i].yCm;
      const r2 = dx * dx + dy * dy + d2;
      const w = ledWeights ? ledWeights[i] : 1;
      lnCos[k * nLed + i] = 0.5 * Math.log(d2 / r2);
      lnBase[k * nLed + i] = w > 0 ? Math.log(w / r2) : -Infinity;
    }
  });
  return (n: number) => {
    const out = new Float64Array(points.length);
    for (let k = 0; k < points.length; k++) {
      let sum = 0;
      const off = k * nLed;
      for (let i = 0; i < nLed; i++) sum += Math.exp((n + 1) * lnCos[off + i] + lnBase[off + i]);
      out[k] = sum;
    }
    return out;
  };
}

/** Irradiance at one receiver point, in (unit of intensityPerLed)/cm². */
export function ledArrayIrradiance(array: LedArray, point: ReceiverPoint): number {
  return ledArrayIrradianceAt(array, [point])[0];
}

/** Irradiance at many receiver points, in (unit of intensityPerLed)/cm². */
export function ledArrayIrradianceAt(array: LedArray, points: readonly ReceiverPoint[]): number[] {
  const n = lambertianOrderFromFullAngleDeg(array.fullAngleDeg);
  const perUnit = makeArrayIrradianceEvaluator(array, points, array.ledWeights)(n);
  const i0 = array.intensityPerLed ?? 1;
  return Array.from(perUnit, (v) => v * i0);
}
