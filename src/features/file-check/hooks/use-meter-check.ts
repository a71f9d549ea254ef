import { useMemo, useState } from 'react';
import { parseLengthCm } from '#shared/measurement/check/footprint-text.ts';
import type { MeterReadingsFileCheck } from '#shared/measurement/check/check-meter-readings-file.ts';
import type { FootprintCm } from '#shared/measurement/plane/uniformity.ts';
import { checkMeterReadingsOnPage } from '../utils/page-checks.ts';
import { useReadFiles } from './use-read-files.ts';

export interface FootprintText {
  widthCm: string;
  heightCm: string;
}

/** A footprint dimension as typed: empty is "not given", anything else must be a positive number. */
function readLength(text: string): { value: number | null; error?: string } {
  if (text.trim() === '') return { value: null };
  const value = parseLengthCm(text);
  return value === null ? { value: null, error: 'Enter a length above 0 cm, or leave it empty.' } : { value };
}

/** One meter-readings file, checked again when the emitting area changes (uniformity depends on it). */
export function useMeterCheck() {
  const { files, add, clear } = useReadFiles({ single: true });
  const [footprintText, setFootprintText] = useState<FootprintText>({ widthCm: '', heightCm: '' });
  const file = files[0] ?? null;
  const bytes = file?.bytes ?? null;

  const width = readLength(footprintText.widthCm);
  const height = readLength(footprintText.heightCm);
  // Keyed on the numbers, so typing the same value again does not redo the figures.
  const footprint = useMemo<FootprintCm | null>(
    () => (width.value !== null && height.value !== null ? { widthCm: width.value, heightCm: height.value } : null),
    [width.value, height.value],
  );

  const check = useMemo<MeterReadingsFileCheck | null>(() => (bytes ? checkMeterReadingsOnPage(bytes, footprint) : null), [bytes, footprint]);

  return {
    file,
    check,
    footprint,
    footprintText,
    footprintErrors: { widthCm: width.error, heightCm: height.error },
    setFootprintText,
    add,
    clear,
  };
}
