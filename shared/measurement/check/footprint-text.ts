import type { FootprintCm } from '../plane/uniformity.ts';

const NUMBER = String.raw`\d+(?:[.,]\d+)?`;
const FOOTPRINT = new RegExp(String.raw`^\s*(${NUMBER})\s*[xX×]\s*(${NUMBER})\s*$`);

/** A positive length in cm typed by a person (`34`, `30.5`, `30,5`); null when empty or not one. */
export function parseLengthCm(text: string): number | null {
  const trimmed = text.trim().replace(',', '.');
  if (!/^\d+(?:\.\d+)?$/.test(trimmed)) return null;
  const value = Number(trimmed);
  return value > 0 ? value : null;
}

/** `34x80`, `34 X 80`, `34×80`, `34.5x80` → W × H in cm; null when malformed or not positive. */
export function parseFootprintCm(text: string): FootprintCm | null {
  const m = FOOTPRINT.exec(text);
  if (!m) return null;
  const widthCm = parseLengthCm(m[1]);
  const heightCm = parseLengthCm(m[2]);
  return widthCm !== null && heightCm !== null ? { widthCm, heightCm } : null;
}
