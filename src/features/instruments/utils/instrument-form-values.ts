import { instrumentBodySchema, type Instrument, type InstrumentBody, type InstrumentKind } from '#shared/schemas/instruments.ts';
import { formSchema, numberOrNull, numberText, textOrNull } from '#src/lib/form-schema.ts';

/** The instrument form as typed: numbers and dates are text until the form is sent. */
export interface InstrumentFormValues {
  kind: InstrumentKind | '';
  name: string;
  serial: string;
  wavelengthRangeNm: { from: string; to: string };
  cosineCorrector: string;
  /** YYYY-MM-DD from date inputs. */
  calibratedOn: string;
  calibrationDueOn: string;
  calibrationUncertaintyPct: string;
  notes: string;
}

export const emptyInstrumentForm: InstrumentFormValues = {
  kind: '',
  name: '',
  serial: '',
  wavelengthRangeNm: { from: '', to: '' },
  cosineCorrector: '',
  calibratedOn: '',
  calibrationDueOn: '',
  calibrationUncertaintyPct: '',
  notes: '',
};

export function instrumentToFormValues(i: Instrument): InstrumentFormValues {
  return {
    kind: i.kind,
    name: i.name,
    serial: i.serial,
    wavelengthRangeNm: { from: numberText(i.wavelengthRangeNm?.from), to: numberText(i.wavelengthRangeNm?.to) },
    cosineCorrector: i.cosineCorrector ?? '',
    calibratedOn: i.calibratedOn,
    calibrationDueOn: i.calibrationDueOn,
    calibrationUncertaintyPct: numberText(i.calibrationUncertaintyPct),
    notes: i.notes,
  };
}

/** A range left wholly blank is "not stated" (null); half a range is refused by the shared schema. */
export function toInstrumentBody(v: InstrumentFormValues): unknown {
  const { from, to } = v.wavelengthRangeNm;
  const blankRange = from.trim() === '' && to.trim() === '';
  return {
    kind: v.kind === '' ? undefined : v.kind,
    name: v.name,
    serial: v.serial,
    wavelengthRangeNm: blankRange ? null : { from: numberOrNull(from) ?? undefined, to: numberOrNull(to) ?? undefined },
    cosineCorrector: textOrNull(v.cosineCorrector),
    calibratedOn: textOrNull(v.calibratedOn) ?? undefined,
    calibrationDueOn: textOrNull(v.calibrationDueOn) ?? undefined,
    calibrationUncertaintyPct: numberOrNull(v.calibrationUncertaintyPct) ?? undefined,
    notes: v.notes,
  };
}

/** Where an issue of the body shows on the form (a range's own issue goes to its first field). */
export function instrumentFieldFor(bodyPath: string): string {
  return bodyPath === 'wavelengthRangeNm' ? 'wavelengthRangeNm.from' : bodyPath;
}

const FIELDS = new Set([
  'kind',
  'name',
  'serial',
  'wavelengthRangeNm.from',
  'wavelengthRangeNm.to',
  'cosineCorrector',
  'calibratedOn',
  'calibrationDueOn',
  'calibrationUncertaintyPct',
  'notes',
]);

export function isInstrumentField(field: string): boolean {
  return FIELDS.has(field);
}

export const instrumentFormSchema = formSchema<InstrumentFormValues, InstrumentBody>(instrumentBodySchema, toInstrumentBody, instrumentFieldFor);
