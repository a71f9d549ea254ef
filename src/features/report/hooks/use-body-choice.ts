import { useEffect, useMemo, useRef, useState } from 'react';
import type { BodyOverlay } from '#shared/measurement/plane/body-outline.ts';
import { useDisplayUnits } from '#src/lib/display-units.tsx';
import { formatLength } from '#src/lib/format.ts';
import {
  anchorHeightCm,
  BODY_LIMITS_CM,
  BODY_SIZE_PRESETS,
  placedOverlay,
  type BodySize,
  type BodySizePreset,
  type PlacementAnchor,
} from '../utils/body-placement.ts';

export type SizeChoice = BodySizePreset | 'custom';
export type PlacementChoice = PlacementAnchor | 'custom';

export interface BodyChoiceForm {
  size: SizeChoice;
  /** Typed in the reader's length unit. */
  customWidth: string;
  customHeight: string;
  placement: PlacementChoice;
  /** Height of the unit's centre above the soles, typed in the reader's length unit. */
  customPlacement: string;
}

export interface BodyChoiceErrors {
  width?: string;
  height?: string;
  placement?: string;
}

/** A number as typed ("12", "12.5", "12,5"), or null. */
function readNumber(text: string): number | null {
  const t = text.trim().replace(',', '.');
  return /^\d+(?:\.\d+)?$/.test(t) ? Number(t) : null;
}

const CM_PER_INCH = 2.54; // exact by definition (1959)

/**
 * The reader's body and its placement in front of the unit: a preset or typed size, and the
 * height on the body facing the unit's centre (a named point or a typed height above the soles).
 * Typed values are in the reader's length unit and are rewritten when the unit changes. While a
 * typed value does not read, the figure keeps the last body that did.
 */
export function useBodyChoice() {
  const units = useDisplayUnits();
  const [form, setForm] = useState<BodyChoiceForm>({ size: 'medium', customWidth: '', customHeight: '', placement: 'torso', customPlacement: '' });
  const toCm = (v: number) => (units.length === 'in' ? v * CM_PER_INCH : v);
  const show = (cm: number) => formatLength(units.lengthValue(cm));

  // Typed text follows the reader's unit: 42 (cm) becomes 16.5 (in) and back.
  const lastUnit = useRef(units.length);
  useEffect(() => {
    if (lastUnit.current === units.length) return;
    const factor = units.length === 'in' ? 1 / CM_PER_INCH : CM_PER_INCH;
    lastUnit.current = units.length;
    const convert = (text: string) => {
      const v = readNumber(text);
      return v === null ? text : formatLength(v * factor);
    };
    setForm((f) => ({ ...f, customWidth: convert(f.customWidth), customHeight: convert(f.customHeight), customPlacement: convert(f.customPlacement) }));
  }, [units.length]);

  const read = useMemo(() => {
    const errors: BodyChoiceErrors = {};
    const limit = (lo: number, hi: number) => `from ${show(lo)} to ${show(hi)} ${units.length}`;
    let body: BodySize | null = null;
    if (form.size === 'custom') {
      const w = readNumber(form.customWidth);
      const h = readNumber(form.customHeight);
      const { shoulderWidth: sw, height: ht } = BODY_LIMITS_CM;
      const wCm = w === null ? null : toCm(w);
      const hCm = h === null ? null : toCm(h);
      if (wCm === null || wCm < sw.min - 1e-9 || wCm > sw.max + 1e-9) errors.width = `Enter a shoulder width ${limit(sw.min, sw.max)}.`;
      if (hCm === null || hCm < ht.min - 1e-9 || hCm > ht.max + 1e-9) errors.height = `Enter a height ${limit(ht.min, ht.max)}.`;
      if (!errors.width && !errors.height && wCm !== null && hCm !== null) body = { shoulderWidthCm: wCm, heightCm: hCm };
    } else {
      body = BODY_SIZE_PRESETS[form.size];
    }
    let unitCenterHeightCm: number | null = null;
    if (body) {
      if (form.placement === 'custom') {
        const p = readNumber(form.customPlacement);
        const pCm = p === null ? null : toCm(p);
        if (pCm === null || pCm > body.heightCm + 1e-9) errors.placement = `Enter a height ${limit(0, body.heightCm)} above the floor.`;
        else unitCenterHeightCm = pCm;
      } else {
        unitCenterHeightCm = anchorHeightCm(body, form.placement);
      }
    }
    return { body, unitCenterHeightCm, errors };
    // toCm and show depend on units.length only.
  }, [form, units.length]);

  const placed = useMemo(() => {
    if (!read.body || read.unitCenterHeightCm === null) return null;
    return { body: read.body, unitCenterHeightCm: read.unitCenterHeightCm, overlay: placedOverlay(read.body, read.unitCenterHeightCm) };
  }, [read.body, read.unitCenterHeightCm]);
  const lastGood = useRef<{ body: BodySize; unitCenterHeightCm: number; overlay: BodyOverlay } | null>(null);
  if (placed) lastGood.current = placed;
  const current = placed ?? lastGood.current ?? {
    body: BODY_SIZE_PRESETS.medium,
    unitCenterHeightCm: anchorHeightCm(BODY_SIZE_PRESETS.medium, 'torso'),
    overlay: placedOverlay(BODY_SIZE_PRESETS.medium, anchorHeightCm(BODY_SIZE_PRESETS.medium, 'torso')),
  };

  /** Choosing "custom" starts from what is shown, in the reader's unit. */
  const setSize = (size: SizeChoice) =>
    setForm((f) => ({
      ...f,
      size,
      ...(size === 'custom' && !f.customWidth && !f.customHeight
        ? { customWidth: show(current.body.shoulderWidthCm), customHeight: show(current.body.heightCm) }
        : {}),
    }));
  const setPlacement = (placement: PlacementChoice) =>
    setForm((f) => ({
      ...f,
      placement,
      ...(placement === 'custom' && !f.customPlacement ? { customPlacement: show(current.unitCenterHeightCm) } : {}),
    }));

  return { form, setForm, setSize, setPlacement, errors: read.errors, ...current };
}
