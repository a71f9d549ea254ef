import { useMemo, useState } from 'react';
import type { FootprintCm } from '#shared/measurement/plane/uniformity.ts';
import {
  checkMeterReadings,
  falloffFigures,
  planeFigures,
  type FalloffFigures,
  type MeterCheck,
  type PlaneFigures,
} from '../utils/check-meter-readings.ts';
import { useReadFiles } from './use-read-files.ts';

export interface FootprintText {
  widthCm: string;
  heightCm: string;
}

/** A footprint dimension as typed: empty is "not given", anything else must be a positive number. */
export function parseCm(text: string): { value: number | null; error?: string } {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return { value: null };
  const value = Number(trimmed);
  if (!Number.isFinite(value) || value <= 0) return { value: null, error: 'Enter a length above 0 cm, or leave it empty.' };
  return { value };
}

/**
 * One meter-readings file: the maps are computed once per file, the scalar figures again when
 * the footprint changes (only uniformity depends on it).
 */
export function useMeterCheck() {
  const { files, add, clear } = useReadFiles({ single: true });
  const [footprintText, setFootprintText] = useState<FootprintText>({ widthCm: '', heightCm: '' });
  const file = files[0] ?? null;
  const decoded = file?.decoded ?? null;

  const check = useMemo<MeterCheck | null>(() => (decoded ? checkMeterReadings(decoded) : null), [decoded]);

  const width = parseCm(footprintText.widthCm);
  const height = parseCm(footprintText.heightCm);
  // Keyed on the numbers, so typing the same value again does not redo the figures.
  const footprint = useMemo<FootprintCm | undefined>(
    () => (width.value !== null && height.value !== null ? { widthCm: width.value, heightCm: height.value } : undefined),
    [width.value, height.value],
  );

  const figures = useMemo<PlaneFigures[]>(() => (check ? planeFigures(check.planes, footprint) : []), [check, footprint]);
  const falloff = useMemo<FalloffFigures | null>(() => (figures.length ? falloffFigures(figures) : null), [figures]);

  return {
    file,
    check,
    figures,
    falloff,
    footprint,
    footprintText,
    footprintErrors: { widthCm: width.error, heightCm: height.error },
    setFootprintText,
    add,
    clear,
  };
}
