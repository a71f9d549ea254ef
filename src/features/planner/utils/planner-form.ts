/**
 * The planner's controls as typed, and the planner input they make when every field reads.
 * Numbers are typed as text so a half-typed value never jumps; a field that does not read gives
 * an error and no plans, never a guess.
 */
import { BODY_ZONE_LABELS } from '#src/components/figures/body-zones.ts';
import { DEFAULT_DOSE_TARGETS_JCM2 } from '#shared/measurement/dose/radiant-exposure.ts';
import type { BodyZoneName } from '#shared/measurement/plane/body-outline.ts';
import { BODY_SIZE_PRESETS, type BodySizePreset } from '#shared/measurement/planner/body-sizes.ts';
import { DEFAULT_COVER_SHARE, DEFAULT_DOSE_CAP_MULTIPLE } from '#shared/measurement/planner/plan-settings.ts';
import type { BodySizeCm, MeasuredPlane, SessionPlanInput } from '#shared/measurement/planner/types.ts';

export type BodySizeChoice = BodySizePreset | 'custom';

export interface PlannerForm {
  zones: BodyZoneName[];
  bodySize: BodySizeChoice;
  customBody: { shoulderWidthCm: string; heightCm: string };
  /** A preset dose as its number, or 'custom'. */
  dose: string;
  customDose: string;
  /** Covered share, per cent. */
  coverPct: string;
  doseCapMultiple: string;
  maxIrradiance: string;
  maxMinutes: string;
}

export interface PlannerDefaults {
  zones?: BodyZoneName[];
  bodySize?: BodySizePreset;
  doseJCm2?: number;
  coverShare?: number;
}

/** The outline's zones as readers see them named: one list for the report's map and the planner. */
export const ZONE_LABELS = BODY_ZONE_LABELS;

export const BODY_SIZE_LABELS: Readonly<Record<BodySizeChoice, string>> = {
  small: 'Small',
  medium: 'Medium',
  large: 'Large',
  custom: 'Custom',
};

export function initialForm(defaults: PlannerDefaults = {}): PlannerForm {
  const dose = defaults.doseJCm2 ?? 10;
  const preset = DEFAULT_DOSE_TARGETS_JCM2.includes(dose);
  return {
    zones: defaults.zones ?? ['chest', 'abdomen'],
    bodySize: defaults.bodySize ?? 'medium',
    customBody: { shoulderWidthCm: '', heightCm: '' },
    dose: preset ? String(dose) : 'custom',
    customDose: preset ? '' : String(dose),
    coverPct: String(Math.round((defaults.coverShare ?? DEFAULT_COVER_SHARE) * 100)),
    doseCapMultiple: String(DEFAULT_DOSE_CAP_MULTIPLE),
    maxIrradiance: '',
    maxMinutes: '',
  };
}

/** A number as typed (`12`, `12.5`, `12,5`), or null. */
function readNumber(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (!/^\d+(?:\.\d+)?$/.test(t)) return null;
  return Number(t);
}

export type FormErrors = Partial<Record<'zones' | 'shoulderWidthCm' | 'heightCm' | 'dose' | 'coverPct' | 'doseCapMultiple' | 'maxIrradiance' | 'maxMinutes', string>>;

export interface ReadForm {
  errors: FormErrors;
  body: BodySizeCm | null;
  doseJCm2: number | null;
  /** The planner input, when every field reads. */
  input: Omit<SessionPlanInput, 'planes'> | null;
}

function inRange(text: string, lo: number, hi: number): number | null {
  const v = readNumber(text);
  return v !== null && v >= lo && v <= hi ? v : null;
}

/** An optional cap: empty is "none". */
function optionalCap(text: string, lo: number, hi: number): { value: number | null; ok: boolean } {
  if (text.trim() === '') return { value: null, ok: true };
  const v = inRange(text, lo, hi);
  return { value: v, ok: v !== null && v > 0 };
}

export function readForm(form: PlannerForm): ReadForm {
  const errors: FormErrors = {};
  if (form.zones.length === 0) errors.zones = 'Choose at least one body zone.';

  let body: BodySizeCm | null = null;
  if (form.bodySize === 'custom') {
    const shoulderWidthCm = inRange(form.customBody.shoulderWidthCm, 20, 80);
    const heightCm = inRange(form.customBody.heightCm, 100, 230);
    if (shoulderWidthCm === null) errors.shoulderWidthCm = 'Enter a shoulder width from 20 to 80 cm.';
    if (heightCm === null) errors.heightCm = 'Enter a height from 100 to 230 cm.';
    if (shoulderWidthCm !== null && heightCm !== null) body = { shoulderWidthCm, heightCm };
  } else {
    body = BODY_SIZE_PRESETS[form.bodySize];
  }

  const doseJCm2 = form.dose === 'custom' ? inRange(form.customDose, 0.1, 1000) : Number(form.dose);
  if (doseJCm2 === null || !(doseJCm2 > 0)) errors.dose = 'Enter a dose from 0.1 to 1000 J/cm².';

  const coverPct = inRange(form.coverPct, 1, 100);
  if (coverPct === null) errors.coverPct = 'Enter a share from 1 to 100 %.';

  const doseCap = optionalCap(form.doseCapMultiple, 1, 1000);
  if (!doseCap.ok) errors.doseCapMultiple = 'Enter a multiple of at least 1, or leave it empty for no cap.';
  const maxIrradiance = optionalCap(form.maxIrradiance, 0, 10000);
  if (!maxIrradiance.ok) errors.maxIrradiance = 'Enter an irradiance above 0 mW/cm², or leave it empty.';
  const maxMinutes = optionalCap(form.maxMinutes, 0, 1000);
  if (!maxMinutes.ok) errors.maxMinutes = 'Enter a number of minutes above 0, or leave it empty.';

  const valid = Object.keys(errors).length === 0 && body !== null && doseJCm2 !== null && coverPct !== null;
  return {
    errors,
    body,
    doseJCm2: doseJCm2 ?? null,
    input: valid
      ? {
          target: { kind: 'zones', zones: form.zones, body: body! },
          doseJCm2: doseJCm2!,
          coverShare: coverPct! / 100,
          caps: { maxDoseMultiple: doseCap.value, maxIrradianceMwCm2: maxIrradiance.value, maxMinutesPerPosition: maxMinutes.value },
        }
      : null,
  };
}

/** The full input once the planes are known. */
export function withPlanes(
  input: ReadForm['input'],
  planes: readonly MeasuredPlane[],
  unitSizeCm: SessionPlanInput['unitSizeCm'],
): SessionPlanInput | null {
  return input && planes.length > 0 ? { ...input, planes, unitSizeCm: unitSizeCm ?? null } : null;
}
