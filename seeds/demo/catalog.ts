/**
 * The demo scenario: fictional makers, models, units and instruments invented for Benchlight.
 * Naming patterns are our own: instruments are named after birds, devices after landscape words
 * with a plain-words category; serials are maker initials, year and a sequence number.
 * Any likeness to a real brand is accidental. Emission follows the LED-array model
 * (geometry/led-array.ts); the numbers are chosen to look like bench results, not copied.
 */
import type { LineShape } from './line-shapes.ts';

export type ExportFormat = 'comma-preamble' | 'semicolon-decimal-comma' | 'tab-counts-descending' | 'comma-bom';

export interface DemoEmitter extends LineShape {
  /** Share of the unit's optical power from this emitter type. */
  powerFraction: number;
}

export interface DemoUnit {
  id: string;
  kind: 'body panel' | 'small panel' | 'flexible mat' | 'half-body panel';
  maker: string;
  model: string;
  serial: string;
  /** Emitting area: x runs along widthCm, y along heightCm, centred on the grid origin. */
  widthCm: number;
  heightCm: number;
  ledPitchCm: number;
  /** 'interleaved': single-colour LEDs in a repeating pattern; 'multi-chip': every package holds all colours. */
  ledLayout: 'interleaved' | 'multi-chip';
  /** True full angle at half intensity of the model's LEDs, degrees. */
  modelFullAngleDeg: number;
  /** Spread of LED output between LEDs (relative standard deviation). */
  ledBinSpread: number;
  /** Centre irradiance of the model at 15 cm, mW/cm² (sets the LED intensity). */
  centerAt15CmMwCm2: number;
  emitters: DemoEmitter[];
  claimedBeamAngle: { angleDeg: number; statesHalfAngle: boolean; wording: string };
  claimedIrradiance: { mwCm2: number; distanceCm: number; wording: string };
}

export interface DemoInstrument {
  id: string;
  kind: 'spectroradiometer' | 'irradiance meter';
  maker: string;
  model: string;
  serial: string;
  calibrationDate: string;
  rangeNm: { from: number; to: number } | null;
  format: ExportFormat | 'meter-readings';
}

export const DEMO_INSTRUMENTS: readonly DemoInstrument[] = [
  { id: 'tallis-wren', kind: 'spectroradiometer', maker: 'Tallis Instruments', model: 'Wren bench spectroradiometer', serial: 'TI-23-0031', calibrationDate: '2026-02-11', rangeNm: { from: 350, to: 1050 }, format: 'comma-preamble' },
  { id: 'hexmoor-fieldfare', kind: 'spectroradiometer', maker: 'Hexmoor Metrology', model: 'Fieldfare array spectroradiometer', serial: 'HM-22-0207', calibrationDate: '2025-09-28', rangeNm: { from: 350, to: 1050 }, format: 'semicolon-decimal-comma' },
  { id: 'pellow-linnet', kind: 'spectroradiometer', maker: 'Pellow Scientific', model: 'Linnet compact spectrometer', serial: 'PS-24-1180', calibrationDate: '2026-01-20', rangeNm: { from: 345, to: 1041 }, format: 'tab-counts-descending' },
  { id: 'orrin-siskin', kind: 'spectroradiometer', maker: 'Orrin Labs', model: 'Siskin benchtop spectroradiometer', serial: 'OL-23-0456', calibrationDate: '2025-12-03', rangeNm: { from: 350, to: 1050 }, format: 'comma-bom' },
  { id: 'tallis-stonechat', kind: 'irradiance meter', maker: 'Tallis Instruments', model: 'Stonechat thermopile meter', serial: 'TI-24-0112', calibrationDate: '2026-02-11', rangeNm: null, format: 'meter-readings' },
];

const red = (peakNm: number, fwhmNm: number, powerFraction: number): DemoEmitter => ({
  peakNm, fwhmNm, powerFraction, asymmetry: 0.15, lorentzFraction: 0.06,
});
const nir = (peakNm: number, fwhmNm: number, powerFraction: number): DemoEmitter => ({
  peakNm, fwhmNm, powerFraction, asymmetry: 0.2, lorentzFraction: 0.08,
});

export const DEMO_UNITS: readonly DemoUnit[] = [
  {
    id: 'corvane-fenwick',
    kind: 'body panel',
    maker: 'Corvane Photonics',
    model: 'Fenwick torso panel',
    serial: 'CVP-2024-00417',
    widthCm: 80,
    heightCm: 34,
    ledPitchCm: 2.8,
    ledLayout: 'interleaved',
    modelFullAngleDeg: 60,
    ledBinSpread: 0.05,
    centerAt15CmMwCm2: 82,
    emitters: [red(630, 17, 0.2), red(660, 19, 0.3), nir(810, 32, 0.1), nir(830, 36, 0.15), nir(850, 38, 0.25)],
    claimedBeamAngle: { angleDeg: 30, statesHalfAngle: false, wording: 'Beam angle 30°' },
    claimedIrradiance: { mwCm2: 150, distanceCm: 0, wording: '> 150 mW/cm² at the surface' },
  },
  {
    id: 'aldermoor-tarn',
    kind: 'small panel',
    maker: 'Aldermoor Light Co.',
    model: 'Tarn hand panel',
    serial: 'ALM-2024-2291',
    widthCm: 30,
    heightCm: 20,
    ledPitchCm: 2.5,
    ledLayout: 'interleaved',
    modelFullAngleDeg: 45,
    ledBinSpread: 0.04,
    centerAt15CmMwCm2: 52,
    emitters: [red(660, 18, 0.6), nir(850, 37, 0.4)],
    claimedBeamAngle: { angleDeg: 45, statesHalfAngle: false, wording: 'Beam angle 45°' },
    claimedIrradiance: { mwCm2: 75, distanceCm: 15, wording: '75 mW/cm² at 15 cm' },
  },
  {
    id: 'quenby-mere',
    kind: 'flexible mat',
    maker: 'Quenby Therapeutics',
    model: 'Mere wrap mat',
    serial: 'QT-2023-0088',
    widthCm: 60,
    heightCm: 30,
    ledPitchCm: 3,
    ledLayout: 'multi-chip',
    modelFullAngleDeg: 120,
    ledBinSpread: 0.06,
    centerAt15CmMwCm2: 22,
    emitters: [red(630, 16, 0.15), red(660, 19, 0.25), nir(850, 40, 0.6)],
    claimedBeamAngle: { angleDeg: 120, statesHalfAngle: false, wording: 'Wide 120° emission' },
    claimedIrradiance: { mwCm2: 40, distanceCm: 0, wording: '40 mW/cm² in contact' },
  },
  {
    id: 'norrow-holt',
    kind: 'half-body panel',
    maker: 'Norrow & Vale',
    model: 'Holt half-body panel',
    serial: 'NV-2024-1203',
    widthCm: 45,
    heightCm: 30,
    ledPitchCm: 2.5,
    ledLayout: 'interleaved',
    modelFullAngleDeg: 90,
    ledBinSpread: 0.05,
    centerAt15CmMwCm2: 68,
    emitters: [red(660, 19, 0.45), nir(810, 33, 0.2), nir(850, 38, 0.35)],
    claimedBeamAngle: { angleDeg: 60, statesHalfAngle: false, wording: '60° lenses' },
    claimedIrradiance: { mwCm2: 120, distanceCm: 15, wording: 'Up to 120 mW/cm² at 15 cm' },
  },
  {
    // A second unit of the body panel, from a later batch: the report on the model shows the spread.
    id: 'corvane-fenwick-b',
    kind: 'body panel',
    maker: 'Corvane Photonics',
    model: 'Fenwick torso panel',
    serial: 'CVP-2024-00452',
    widthCm: 80,
    heightCm: 34,
    ledPitchCm: 2.8,
    ledLayout: 'interleaved',
    modelFullAngleDeg: 60,
    ledBinSpread: 0.06,
    centerAt15CmMwCm2: 78.5,
    emitters: [red(630, 17, 0.2), red(660, 19, 0.3), nir(810, 32, 0.1), nir(830, 36, 0.15), nir(850, 38, 0.25)],
    claimedBeamAngle: { angleDeg: 30, statesHalfAngle: false, wording: 'Beam angle 30°' },
    claimedIrradiance: { mwCm2: 150, distanceCm: 0, wording: '> 150 mW/cm² at the surface' },
  },
];

/** Which spectroradiometer measured which unit; the meter measured every unit. */
export const DEMO_RUN_INSTRUMENT: Readonly<Record<string, string>> = {
  'corvane-fenwick': 'tallis-wren',
  'aldermoor-tarn': 'hexmoor-fieldfare',
  'quenby-mere': 'pellow-linnet',
  'norrow-holt': 'orrin-siskin',
  'corvane-fenwick-b': 'tallis-wren',
};

export const DEMO_METER_ID = 'tallis-stonechat';
