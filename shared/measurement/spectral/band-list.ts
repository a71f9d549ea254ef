/**
 * Named bands. The default red / near-infrared split is a working convention of
 * photobiomodulation writing, not a standard: reports print it beside the figures.
 */
import type { WavelengthBand } from './spectrum.ts';

export const DEFAULT_BANDS: Readonly<Record<string, WavelengthBand>> = {
  red: { loNm: 600, hiNm: 700 },
  nir: { loNm: 700, hiNm: 1100 },
};

export type BandListResult = { ok: true; bands: Record<string, WavelengthBand> } | { ok: false; message: string };

const NUMBER = String.raw`\d+(?:\.\d+)?`;
const ENTRY = new RegExp(String.raw`^([^=,]+)=(${NUMBER})\s*-\s*(${NUMBER})$`);

/** Parses `red=600-700,nir=700-1100` (names as given, edges in nm, lo < hi). */
export function parseBandList(text: string): BandListResult {
  // No prototype, so a band called `constructor` or `__proto__` is just a name.
  const bands = Object.create(null) as Record<string, WavelengthBand>;
  const entries = text.split(',').map((e) => e.trim()).filter((e) => e !== '');
  if (entries.length === 0) return { ok: false, message: 'no band given' };
  for (const entry of entries) {
    const m = ENTRY.exec(entry);
    if (!m) return { ok: false, message: `"${entry}" is not NAME=LO-HI (e.g. red=600-700)` };
    const name = m[1].trim();
    const loNm = Number(m[2]);
    const hiNm = Number(m[3]);
    if (!(loNm < hiNm)) return { ok: false, message: `band "${name}": the lower edge must be below the upper edge` };
    if (Object.hasOwn(bands, name)) return { ok: false, message: `band "${name}" is given twice` };
    bands[name] = { loNm, hiNm };
  }
  return { ok: true, bands };
}
