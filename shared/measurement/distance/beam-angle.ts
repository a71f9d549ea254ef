/**
 * Effective beam angle: the full angle at half intensity of identical cosⁿ LEDs filling the
 * unit's emitting area that best reproduces the measured lateral profiles at all distances.
 * One overall scale (the LED intensity) is left free; the shape decides the angle.
 */
import {
  lambertianOrderFromFullAngleDeg,
  makeArrayIrradianceEvaluator,
  type LedArrayGeometry,
} from '../geometry/led-array.ts';

export interface ProfileReading {
  distanceCm: number;
  xCm: number;
  yCm: number;
  /** Irradiance in any one unit; readings ≤ 0 or non-finite are left out of the fit. */
  irradiance: number;
}

export interface BeamAngleClaim {
  /** The angle as printed on the data sheet, degrees. */
  angleDeg: number;
  /** True when the sheet states a half angle (θ½) rather than the full angle. */
  statesHalfAngle: boolean;
}

export interface BeamAngleFit {
  fittedFullAngleDeg: number;
  /** Claim converted to a full angle; null without a claim. */
  claimedFullAngleDeg: number | null;
  /** Which way the claim was read; null without a claim. */
  claimIsHalfAngle: boolean | null;
  /**
   * Which reading of the printed number lies nearer the fit: data sheets mix up full and half
   * angles, so an editor can see when the other reading fits better. Null without a claim.
   */
  claimNearerAs: 'full' | 'half' | null;
  /** RMS of (model − reading)/reading over the readings used (a fraction). */
  residualRms: number;
  /** Best on-axis intensity per LED, in (reading unit)·cm². */
  scale: number;
  readingsUsed: number;
}

export interface BeamAngleSearch {
  minFullAngleDeg?: number;
  maxFullAngleDeg?: number;
  /** Coarse grid step before the golden-section refinement, degrees. */
  gridStepDeg?: number;
  toleranceDeg?: number;
}

const GOLDEN = (Math.sqrt(5) - 1) / 2;

/**
 * Fits the full angle at half intensity. Relative residuals weight the dim edge readings like
 * the bright centre ones, so the profile's shape, not its peak, sets the angle. For each
 * candidate the best scale is closed-form: minimising Σ(s·mᵢ/yᵢ − 1)² gives s = Σrᵢ / Σrᵢ²,
 * rᵢ = mᵢ/yᵢ. Search: a grid over [10°, 170°], then golden section around the best grid point.
 * Null with fewer than 3 usable readings.
 */
export function fitEffectiveBeamAngle(
  emitter: LedArrayGeometry,
  readings: readonly ProfileReading[],
  claim: BeamAngleClaim | null = null,
  search: BeamAngleSearch = {},
): BeamAngleFit | null {
  const used = readings.filter(
    (r) => r.distanceCm > 0 && r.irradiance > 0 && Number.isFinite(r.irradiance) && Number.isFinite(r.xCm + r.yCm),
  );
  if (used.length < 3) return null;
  const lo = search.minFullAngleDeg ?? 10;
  const hi = search.maxFullAngleDeg ?? 170;
  const step = search.gridStepDeg ?? 2;
  const tol = search.toleranceDeg ?? 0.01;

  const evaluate = makeArrayIrradianceEvaluator(emitter, used);
  const costAt = (fullAngleDeg: number): { cost: number; scale: number } => {
    const model = evaluate(lambertianOrderFromFullAngleDeg(fullAngleDeg));
    let sr = 0;
    let srr = 0;
    for (let i = 0; i < used.length; i++) {
      const r = model[i] / used[i].irradiance;
      sr += r;
      srr += r * r;
    }
    const scale = sr / srr;
    let cost = 0;
    for (let i = 0; i < used.length; i++) cost += (scale * (model[i] / used[i].irradiance) - 1) ** 2;
    return { cost: cost / used.length, scale };
  };

  let bestAngle = lo;
  let bestCost = Infinity;
  for (let a = lo; a <= hi + 1e-9; a += step) {
    const { cost } = costAt(a);
    if (cost < bestCost) {
      bestCost = cost;
      bestAngle = a;
    }
  }
  // Golden section on the bracket around the best grid point.
  let a = Math.max(lo, bestAngle - step);
  let b = Math.min(hi, bestAngle + step);
  let c = b - GOLDEN * (b - a);
  let d = a + GOLDEN * (b - a);
  let fc = costAt(c).cost;
  let fd = costAt(d).cost;
  while (b - a > tol) {
    if (fc < fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - GOLDEN * (b - a);
      fc = costAt(c).cost;
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + GOLDEN * (b - a);
      fd = costAt(d).cost;
    }
  }
  let fitted = (a + b) / 2;
  let best = costAt(fitted);
  if (bestCost < best.cost) {
    fitted = bestAngle;
    best = costAt(bestAngle);
  }

  let claimedFullAngleDeg: number | null = null;
  let claimNearerAs: 'full' | 'half' | null = null;
  if (claim) {
    claimedFullAngleDeg = claim.statesHalfAngle ? 2 * claim.angleDeg : claim.angleDeg;
    // Printed number read as a full angle vs as a half angle (doubled).
    const asFull = Math.abs(claim.angleDeg - fitted);
    const asHalf = Math.abs(2 * claim.angleDeg - fitted);
    // Within 1° of a tie neither reading is favoured: keep the sheet's own.
    if (Math.abs(asHalf - asFull) < 1) claimNearerAs = claim.statesHalfAngle ? 'half' : 'full';
    else claimNearerAs = asHalf < asFull ? 'half' : 'full';
  }
  return {
    fittedFullAngleDeg: fitted,
    claimedFullAngleDeg,
    claimIsHalfAngle: claim ? claim.statesHalfAngle : null,
    claimNearerAs,
    residualRms: Math.sqrt(best.cost),
    scale: best.scale,
    readingsUsed: used.length,
  };
}
