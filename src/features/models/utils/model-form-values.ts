import { modelBodySchema, type Model, type ModelBody, type ModelCategory } from '#shared/schemas/models.ts';
import { type AddFieldIssue, formSchema, numberOrNull, numberText, textOrNull } from '#src/lib/form-schema.ts';
import { majorToMinor, minorToMajor } from '#shared/money/money.ts';

/** The model form as typed: numbers and the price are text until the form is sent. */
export interface ModelFormValues {
  makerId: string;
  name: string;
  category: ModelCategory | '';
  emittingAreaCm: { width: string; height: string };
  ledCount: string;
  nominalWavelengths: { nm: string; sharePct: string }[];
  claims: { irradianceMwCm2: string; atDistanceCm: string; beamAngleDeg: string; beamAngleKind: '' | 'full' | 'half' };
  /** The amount in major units (129.99), as people read prices. */
  price: { amount: string; currency: string };
  powerW: string;
  /** One address per line. */
  links: string;
  notes: string;
}

export const emptyModelForm: ModelFormValues = {
  makerId: '',
  name: '',
  category: '',
  emittingAreaCm: { width: '', height: '' },
  ledCount: '',
  nominalWavelengths: [],
  claims: { irradianceMwCm2: '', atDistanceCm: '', beamAngleDeg: '', beamAngleKind: '' },
  price: { amount: '', currency: '' },
  powerW: '',
  links: '',
  notes: '',
};

export function modelToFormValues(model: Model): ModelFormValues {
  return {
    makerId: model.makerId,
    name: model.name,
    category: model.category,
    emittingAreaCm: { width: numberText(model.emittingAreaCm.width), height: numberText(model.emittingAreaCm.height) },
    ledCount: numberText(model.ledCount),
    nominalWavelengths: model.nominalWavelengths.map((w) => ({ nm: numberText(w.nm), sharePct: numberText(w.sharePct) })),
    claims: {
      irradianceMwCm2: numberText(model.claims.irradianceMwCm2),
      atDistanceCm: numberText(model.claims.atDistanceCm),
      beamAngleDeg: numberText(model.claims.beamAngleDeg),
      beamAngleKind: model.claims.beamAngleKind ?? '',
    },
    price: model.price
      ? { amount: minorToMajor(model.price.amountMinor, model.price.currency), currency: model.price.currency }
      : { amount: '', currency: '' },
    powerW: numberText(model.powerW),
    links: model.links.join('\n'),
    notes: model.notes,
  };
}

/** The price as the API takes it: integer minor units, never a float. Blank amount: no price. */
function priceOf(price: ModelFormValues['price'], addIssue: AddFieldIssue) {
  if (price.amount.trim() === '') return null;
  const currency = price.currency.trim().toUpperCase();
  const minor = majorToMinor(price.amount, /^[A-Z]{3}$/.test(currency) ? currency : 'XXX');
  if (!minor.ok) addIssue('price.amount', minor.message);
  return { amountMinor: minor.ok ? minor.minor : 0, currency };
}

/**
 * Every field is sent, blanks as null or empty lists, so an edit can clear what a create set.
 * Empty wavelength rows are dropped.
 */
export function toModelBody(v: ModelFormValues, addIssue: AddFieldIssue): unknown {
  return {
    makerId: v.makerId,
    name: v.name,
    category: v.category === '' ? undefined : v.category,
    emittingAreaCm: { width: numberOrNull(v.emittingAreaCm.width), height: numberOrNull(v.emittingAreaCm.height) },
    ledCount: numberOrNull(v.ledCount),
    nominalWavelengths: v.nominalWavelengths
      .filter((w) => w.nm.trim() !== '' || w.sharePct.trim() !== '')
      .map((w) => ({ nm: numberOrNull(w.nm), sharePct: numberOrNull(w.sharePct) })),
    claims: {
      irradianceMwCm2: numberOrNull(v.claims.irradianceMwCm2),
      atDistanceCm: numberOrNull(v.claims.atDistanceCm),
      beamAngleDeg: numberOrNull(v.claims.beamAngleDeg),
      beamAngleKind: v.claims.beamAngleKind === '' ? null : v.claims.beamAngleKind,
    },
    price: priceOf(v.price, addIssue),
    powerW: numberOrNull(v.powerW),
    links: v.links
      .split('\n')
      .map((l) => l.trim())
      .filter(Boolean),
    notes: v.notes,
  };
}

/** Where an issue of the body (the shared schema's or the server's) shows on the form. */
export function modelFieldFor(bodyPath: string): string {
  if (bodyPath === 'price' || bodyPath === 'price.amountMinor') return 'price.amount';
  if (bodyPath === 'links' || /^links\.\d+$/.test(bodyPath)) return 'links';
  return bodyPath;
}

const FIELDS = new Set([
  'makerId',
  'name',
  'category',
  'emittingAreaCm.width',
  'emittingAreaCm.height',
  'ledCount',
  'nominalWavelengths',
  'claims.irradianceMwCm2',
  'claims.atDistanceCm',
  'claims.beamAngleDeg',
  'claims.beamAngleKind',
  'price.amount',
  'price.currency',
  'powerW',
  'links',
  'notes',
]);

export function isModelField(field: string): boolean {
  return FIELDS.has(field) || /^nominalWavelengths\.\d+\.(nm|sharePct)$/.test(field);
}

export const modelFormSchema = formSchema<ModelFormValues, ModelBody>(modelBodySchema, toModelBody, modelFieldFor);
