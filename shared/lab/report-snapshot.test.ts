import { describe, expect, it } from 'vitest';
import { buildReportSnapshot, type SnapshotModel, type SnapshotRunInput } from './report-snapshot.ts';

/**
 * Key figures of a report on an analytic field: an elliptical Gaussian of light, E = E₀·exp(−x²/2σx²
 * − y²/2σy²), read on a fine grid (5 cm) so the map's interpolation is close to the field itself.
 * Invented numbers; no real device.
 */
const CENTER: Record<number, number> = { 15: 80, 30: 60, 60: 35 };
const SIGMA: Record<number, { x: number; y: number }> = { 15: { x: 22, y: 16 }, 30: { x: 28, y: 21 }, 60: { x: 38, y: 30 } };
const steps = (from: number, to: number, step: number) => Array.from({ length: Math.round((to - from) / step) + 1 }, (_, i) => from + i * step);
const XS = steps(-80, 80, 5);
const YS = steps(-60, 60, 5);

const model = (price: SnapshotModel['price'], claim: Partial<SnapshotModel['claims']> = {}): SnapshotModel => ({
  name: 'Analytic panel',
  makerName: 'Test maker',
  category: 'panel',
  emittingAreaCm: { width: 40, height: 30 },
  ledCount: null,
  nominalWavelengths: [],
  claims: { irradianceMwCm2: 100, atDistanceCm: 15, beamAngleDeg: null, beamAngleKind: null, ...claim },
  price,
  powerW: null,
  links: [],
});

function run(serial: string, scale: number): SnapshotRunInput {
  return {
    unit: { serial, obtained: 'bought_retail', receivedOn: null, firmware: null },
    instrument: {
      name: 'Test meter', kind: 'irradiance_meter', serial: 'M-1', wavelengthRangeNm: null, cosineCorrector: null,
      calibratedOn: '2026-01-01', calibrationDueOn: '2027-01-01', calibrationUncertaintyPct: 4,
    },
    grid: { distancesCm: [15, 30, 60], xCm: XS, yCm: YS },
    bands: { red: { loNm: 600, hiNm: 700 }, nir: { loNm: 700, hiNm: 1100 } },
    conditions: { roomTempC: null, warmupMinutes: null, mainsVoltageV: null },
    measuredOn: '2026-10-01',
    measuredBy: 'Tester',
    readings: [15, 30, 60].flatMap((d) =>
      YS.flatMap((y) =>
        XS.map((x) => {
          const combined = scale * CENTER[d] * Math.exp(-(x * x) / (2 * SIGMA[d].x ** 2) - (y * y) / (2 * SIGMA[d].y ** 2));
          return { distanceCm: d, xCm: x, yCm: y, values: { combined, red: 0.55 * combined, nir: 0.45 * combined } };
        }),
      ),
    ),
    centerChecks: [],
    spectrum: null,
  };
}

describe('report key figures', { timeout: 60_000 }, () => {
  const eur = buildReportSnapshot(model({ amountMinor: 49900, currency: 'EUR' }), [run('A', 1), run('B', 0.96)]);

  it('reads centre irradiance and the red share off the field (identity with the constructed values)', () => {
    expect(eur.keyFigures.centerMwCm2At15).toBeCloseTo(80, 9);
    expect(eur.keyFigures.centerMwCm2At30).toBeCloseTo(60, 9);
    expect(eur.keyFigures.redSharePct).toBeCloseTo(55, 9);
  });

  it('gives the 50 % spread width of a Gaussian, 2σ·√(2 ln 2) (its full width at half maximum), along the wider axis', () => {
    // FWHM = 2√(2 ln 2)·σ (a property of the normal curve); the wider axis is x at 15 cm, σ = 22 cm.
    expect(eur.keyFigures.spread50CmAt15).toBeCloseTo(2 * Math.sqrt(2 * Math.LN2) * 22, 0);
  });

  it('prices 100 cm² of the area at ≥ 50 % at 30 cm: the ellipse π·σx·σy·2 ln 2 (Gaussian level set), in major units whatever the currency', () => {
    // The level set E ≥ E₀/2 of an elliptical Gaussian is an ellipse with semi-axes σ·√(2 ln 2).
    const area = Math.PI * SIGMA[30].x * SIGMA[30].y * 2 * Math.LN2;
    expect(eur.keyFigures.pricePer100Cm2At30! / (499 / (area / 100))).toBeCloseTo(1, 2);
    // ISO 4217: the yen has no minor unit, the euro two, the Kuwaiti dinar three.
    const jpy = buildReportSnapshot(model({ amountMinor: 49900, currency: 'JPY' }), [run('A', 1)]);
    const kwd = buildReportSnapshot(model({ amountMinor: 49900, currency: 'KWD' }), [run('A', 1)]);
    expect(jpy.keyFigures.pricePer100Cm2At30! / eur.keyFigures.pricePer100Cm2At30!).toBeCloseTo(100, 9);
    expect(kwd.keyFigures.pricePer100Cm2At30! / eur.keyFigures.pricePer100Cm2At30!).toBeCloseTo(0.1, 9);
    expect(jpy.keyFigures.currency).toBe('JPY');
  });

  it('compares a claim at a measured distance directly, and between distances on the measured power law', () => {
    expect(eur.keyFigures.measuredOverClaimed).toBeCloseTo(80 / 100, 9);
    // Between 15 and 30 cm: E = E₁₅·(d/15)^−c with c = ln(E₁₅/E₃₀)/ln 2 (a power law through both points).
    const c = Math.log(80 / 60) / Math.log(2);
    const at20 = buildReportSnapshot(model(null, { atDistanceCm: 20, irradianceMwCm2: 50 }), [run('A', 1)]);
    expect(at20.keyFigures.measuredOverClaimed).toBeCloseTo((80 * (20 / 15) ** -c) / 50, 9);
    // A claim for the surface is not compared: nothing is extrapolated to contact.
    const surface = buildReportSnapshot(model(null, { atDistanceCm: null }), [run('A', 1)]);
    expect(surface.keyFigures.measuredOverClaimed).toBeNull();
    expect(surface.keyFigures.pricePer100Cm2At30).toBeNull();
  });

  it('states the unit-to-unit spread as (max − min) ÷ mean (computed by hand for units 4 % apart)', () => {
    const centre15 = eur.unitSpread!.find((r) => r.figure === 'Centre irradiance at 15 cm')!;
    expect(centre15.values.map((v) => v.serial)).toEqual(['A', 'B']);
    expect(centre15.min).toBeCloseTo(76.8, 9);
    expect(centre15.max).toBeCloseTo(80, 9);
    expect(centre15.spreadPct).toBeCloseTo((3.2 / 78.4) * 100, 9);
    // A dimmer copy of the same shape has the same widths and falloff.
    expect(eur.unitSpread!.find((r) => r.figure === '50 % spread width at 30 cm')!.spreadPct).toBeCloseTo(0, 9);
    expect(eur.unitSpread!.find((r) => r.figure === 'Falloff exponent')!.spreadPct).toBeCloseTo(0, 9);
    expect(buildReportSnapshot(model(null), [run('A', 1)]).unitSpread).toBeNull();
  });
});
