/**
 * Which column holds the wavelength and which the spectral irradiance, judged from header names
 * (and from the unit line under the header when there is one). Extra columns — dark counts, raw
 * counts, a reference, a standard deviation — are left alone.
 */
import { parseUnitSpelling, type UnitSpelling } from './unit-spelling.ts';

const WAVELENGTH_NAME = /^(wave\s*-?\s*length|wave\b|wvl|lambda|λ|wl\b|wl[^a-z]|nm\b|wellenl|longueur)/i;
const NOT_IRRADIANCE =
  /\b(dark|raw|counts?|reference|ref|background|bg|white|std|sd|stdev|sigma|uncertainty|unc|noise|pixel|index|idx|transmittance|reflectance|absorbance|percent|time|temp|temperature|flag|saturated|sat)\b/;

function words(cell: string): string {
  return cell.toLowerCase().replace(/[_\[\]()/.,:;]+/g, ' ');
}

export function isWavelengthName(cell: string): boolean {
  return WAVELENGTH_NAME.test(cell.replace(/^["'#\s]+/, ''));
}

/** Wavelength columns are nm unless the header says µm or ångström. */
export function wavelengthScaleToNm(cell: string): number {
  const w = cell.toLowerCase().replace(/[\u00b5\u03bc]/g, 'u');
  if (/(^|[^a-z])(um|micron|microns|micrometers?|micrometres?)([^a-z]|$)/.test(w)) return 1000;
  if (/[åÅ]|angstrom|(^|[^a-z])a([^a-z]|$)/.test(w) && !/nm/.test(w)) return 0.1;
  return 1;
}

export interface IrradianceColumn {
  index: number;
  /** Unit named in the header cell or in the unit line, if any. */
  unit: UnitSpelling | null;
  name: string;
  /** Other columns that looked just as likely (e.g. `Scan 1`, `Scan 2`); the first was chosen. */
  equallyLikely: string[];
}

function score(name: string, unit: UnitSpelling | null): number {
  const w = words(name);
  if (NOT_IRRADIANCE.test(w)) return -1;
  let points = 0;
  if (unit?.kind === 'spectral') points += 4;
  else if (unit) points += 1;
  if (/irradiance|irrad\b|bestrahlungsst/.test(w)) points += 3;
  if (/spectral|spectrum|spektral/.test(w)) points += 1;
  if (/^\s*(e|ee|el|elambda|eλ|e λ|e e)\b/.test(w)) points += 2;
  if (/\b(value|intensity|power|signal|data|y)\b/.test(w)) points += 1;
  // Exports of repeated scans add the mean beside them: that is the result.
  if (/\b(mean|average|avg|averaged)\b/.test(w)) points += 1;
  return points;
}

/** The best-scoring column (the first of equals); with just one column besides the wavelength, that one. */
export function chooseIrradianceColumn(
  header: readonly string[],
  unitLine: readonly string[] | null,
  wavelengthIndex: number,
): IrradianceColumn | null {
  let best: IrradianceColumn | null = null;
  let bestScore = 0;
  const others: IrradianceColumn[] = [];
  for (let index = 0; index < header.length; index++) {
    const name = header[index];
    if (index === wavelengthIndex || name.trim() === '') continue;
    const unitText = unitLine?.[index] ?? '';
    const unit = parseUnitSpelling(name) ?? (unitText ? parseUnitSpelling(unitText) : null);
    const points = score(`${name} ${unitText}`, unit);
    const column: IrradianceColumn = { index, unit, name, equallyLikely: [] };
    if (points >= 0) others.push(column);
    if (points > bestScore) {
      best = column;
      bestScore = points;
    } else if (best && points === bestScore) {
      best.equallyLikely.push(name);
    }
  }
  if (best) return best;
  return others.length === 1 ? others[0] : null;
}

/**
 * A line under the header that names units (`nm;W/m2/nm;counts`) rather than holding values. It is
 * a row of the same table (two cells or more) and names no wavelength column: a line such as
 * `Wavelength (nm);Irradiance (W/m2/nm)` is the real header under a preamble line, not units.
 */
export function isUnitLine(cells: readonly string[], wavelengthIndex: number): boolean {
  if (cells.length < 2) return false;
  const wl = (cells[wavelengthIndex] ?? '').trim().replace(/^[\[(]|[\])]$/g, '').toLowerCase();
  if (/^(nm|um|µm|μm|a|å|angstrom)$/.test(wl)) return true;
  if (cells.some(isWavelengthName)) return false;
  return cells.some((c) => parseUnitSpelling(c) !== null) && !cells.some((c) => /^[\s"]*[-+]?\.?\d/.test(c));
}
