/**
 * Emission line shapes for demo LEDs: an asymmetric pseudo-Voigt (a Gaussian core with a small
 * Lorentzian share for the wings), wider on the long-wavelength side as LED spectra usually are.
 * Normalised to unit area over all wavelengths, in 1/nm.
 */

export interface LineShape {
  /** Wavelength of the maximum, nm. */
  peakNm: number;
  /** Full width at half maximum, nm. */
  fwhmNm: number;
  /** 0 = symmetric; 0.2 puts 60 % of the width on the long side. In [0, 1). */
  asymmetry: number;
  /** Lorentzian share of the profile, 0 = pure Gaussian. */
  lorentzFraction: number;
}

const GAUSS_HALF_AREA = Math.sqrt(Math.PI / Math.LN2) / 2; // ∫₀^∞ exp(−ln2·(x/h)²) dx / h
const LORENTZ_HALF_AREA = Math.PI / 2; // ∫₀^∞ 1/(1+(x/h)²) dx / h

/** Half widths at half maximum on the short and long sides, nm; they add up to the FWHM. */
export function halfWidthsNm(line: LineShape): { shortNm: number; longNm: number } {
  return { shortNm: (line.fwhmNm / 2) * (1 - line.asymmetry), longNm: (line.fwhmNm / 2) * (1 + line.asymmetry) };
}

/** Profile with peak value 1 (half at peak ± half width). */
function unitPeakProfile(line: LineShape, wavelengthNm: number): number {
  const { shortNm, longNm } = halfWidthsNm(line);
  const u = (wavelengthNm - line.peakNm) / (wavelengthNm < line.peakNm ? shortNm : longNm);
  const eta = line.lorentzFraction;
  return eta / (1 + u * u) + (1 - eta) * Math.exp(-Math.LN2 * u * u);
}

/** Area under the unit-peak profile, nm (exact, over all wavelengths). */
function unitPeakArea(line: LineShape): number {
  const eta = line.lorentzFraction;
  return line.fwhmNm * (eta * LORENTZ_HALF_AREA + (1 - eta) * GAUSS_HALF_AREA);
}

/** Line shape at `wavelengthNm`, 1/nm, integrating to 1 over all wavelengths. */
export function lineShapePerNm(line: LineShape, wavelengthNm: number): number {
  return unitPeakProfile(line, wavelengthNm) / unitPeakArea(line);
}

/** Exact share of the line's power between two wavelengths (closed form of each half). */
export function lineFractionBetween(line: LineShape, fromNm: number, toNm: number): number {
  const cumulative = (x: number): number => {
    const { shortNm, longNm } = halfWidthsNm(line);
    const eta = line.lorentzFraction;
    const side = (h: number, u: number): number =>
      h * (eta * Math.atan(u) + (1 - eta) * GAUSS_HALF_AREA * erf(Math.sqrt(Math.LN2) * u));
    // Area from −∞ to x of the unit-peak profile.
    const shortTotal = side(shortNm, Infinity);
    const area =
      x < line.peakNm
        ? shortTotal - side(shortNm, (line.peakNm - x) / shortNm)
        : shortTotal + side(longNm, (x - line.peakNm) / longNm);
    return area / unitPeakArea(line);
  };
  return cumulative(toNm) - cumulative(fromNm);
}

/** Error function (Abramowitz & Stegun 7.1.26, |error| < 1.5e-7). */
function erf(x: number): number {
  if (x === Infinity) return 1;
  const s = Math.sign(x);
  const a = Math.abs(x);
  const t = 1 / (1 + 0.3275911 * a);
  const y = 1 - ((((1.061405429 * t - 1.453152027) * t + 1.421413741) * t - 0.284496736) * t + 0.254829592) * t * Math.exp(-a * a);
  return s * y;
}
