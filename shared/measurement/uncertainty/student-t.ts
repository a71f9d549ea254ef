/**
 * Coverage factors from Student's t distribution, for an expanded uncertainty whose combined
 * standard uncertainty has finitely many (effective) degrees of freedom (JCGM 100:2008, G.3–G.4).
 * Computed, not tabulated: the t distribution's central probability is an incomplete beta
 * function, P(|T| ≤ t) = 1 − I_{ν/(ν+t²)}(ν/2, ½), solved for t by bisection.
 */

/**
 * Coverage probability of ±2σ for a normal distribution, erf(√2) = 0.9545 (the "95.45 %" column
 * of JCGM 100:2008 Table G.2): with infinitely many degrees of freedom it gives k = 2 exactly.
 */
export const TWO_SIGMA_COVERAGE = 0.9544997361036416;

/** ln Γ(x), x > 0 (Lanczos approximation, 15 significant digits). */
function lnGamma(x: number): number {
  const g = 7;
  const c = [
    0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
    12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
  ];
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - lnGamma(1 - x);
  const z = x - 1;
  let sum = c[0];
  for (let i = 1; i < g + 2; i++) sum += c[i] / (z + i);
  const t = z + g + 0.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
}

/** Continued fraction of the incomplete beta function (modified Lentz). */
function betaContinuedFraction(x: number, a: number, b: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 500; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const step = d * c;
    h *= step;
    if (Math.abs(step - 1) < 1e-15) break;
  }
  return h;
}

/** Regularised incomplete beta function I_x(a, b), 0 ≤ x ≤ 1. */
export function regularizedIncompleteBeta(x: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const front = Math.exp(lnGamma(a + b) - lnGamma(a) - lnGamma(b) + a * Math.log(x) + b * Math.log(1 - x));
  // The continued fraction converges fast for x below (a + 1)/(a + b + 2); use symmetry above it.
  return x < (a + 1) / (a + b + 2)
    ? (front * betaContinuedFraction(x, a, b)) / a
    : 1 - (front * betaContinuedFraction(1 - x, b, a)) / b;
}

/** P(|T| ≤ t) for Student's t with ν degrees of freedom (ν > 0, real). */
export function studentTCentralProbability(t: number, nu: number): number {
  if (t <= 0) return 0;
  return 1 - regularizedIncompleteBeta(nu / (nu + t * t), nu / 2, 0.5);
}

/** P(|Z| ≤ z) for a normal distribution, erf(z/√2): the t distribution's limit for ν → ∞. */
function normalCentralProbability(z: number): number {
  // erf(x) = P(½, x²), the regularised lower incomplete gamma function: series for small x,
  // continued fraction beyond (both converge to full precision here).
  const x2 = (z * z) / 2;
  if (x2 < 1.5) {
    let term = 1 / 0.5;
    let sum = term;
    for (let n = 1; n < 200; n++) {
      term *= x2 / (0.5 + n);
      sum += term;
      if (term < sum * 1e-17) break;
    }
    return sum * Math.exp(-x2 + 0.5 * Math.log(x2) - lnGamma(0.5));
  }
  const tiny = 1e-300;
  let b = x2 + 0.5;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 300; i++) {
    const an = -i * (i - 0.5);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < tiny) d = tiny;
    c = b + an / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const step = d * c;
    h *= step;
    if (Math.abs(step - 1) < 1e-16) break;
  }
  return 1 - Math.exp(-x2 + 0.5 * Math.log(x2) - lnGamma(0.5)) * h;
}

/** The t > 0 at which a central probability (increasing in t) reaches p, by bisection. */
function solveCentral(probability: (t: number) => number, p: number): number {
  let lo = 0;
  let hi = 1;
  while (probability(hi) < p) hi *= 2;
  for (let i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
    const mid = (lo + hi) / 2;
    if (probability(mid) < p) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/**
 * Coverage factor k = t_p(ν): the interval ±k·u_c encloses the fraction p of Student's t
 * distribution with ν degrees of freedom. A non-integer ν is truncated to the integer below, as
 * JCGM 100:2008 G.4.1 allows (the larger, safer k); null or infinite ν gives the normal value
 * (k = 2 for the default p).
 */
export function studentTCoverageFactor(nu: number | null, p: number = TWO_SIGMA_COVERAGE): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`coverage probability must lie in (0, 1), got ${p}`);
  if (nu === null || nu === Infinity) {
    return p === TWO_SIGMA_COVERAGE ? 2 : solveCentral(normalCentralProbability, p);
  }
  // Float noise must not drop a whole ν (19 computed as 18.999999999997) to the integer below.
  const whole = Math.floor(nu * (1 + 1e-9));
  if (!(whole >= 1)) throw new RangeError(`degrees of freedom must be at least 1, got ${nu}`);
  return solveCentral((t) => studentTCentralProbability(t, whole), p);
}
