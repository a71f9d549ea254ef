import { describe, expect, it } from 'vitest';
import type { PublicReport } from '#shared/schemas/reports.ts';
import { formatFigure, formatLength } from '#src/lib/format.ts';
import { claimsForDisplay, type ReaderFormatters } from './claims-display.ts';

// Conversions: 1 mW/cm² = 10 W/m² (SI prefixes, BIPM SI Brochure 2019); 1 in = 2.54 cm exactly
// (international yard and pound agreement, 1959). Values below computed from those.
const si: ReaderFormatters = {
  length: 'in',
  lengthValue: (cm) => cm / 2.54,
  formatIrradiance: (v) => (v === null || v === undefined ? '—' : `${formatFigure(v * 10)} W/m²`),
  formatLength: (v) => (v === null || v === undefined ? '—' : `${formatLength(v / 2.54)} in`),
  formatArea: (v) => (v === null || v === undefined ? '—' : `${formatFigure(v / 6.4516)} in²`),
};

const model: PublicReport['model'] = {
  name: 'Test panel',
  makerName: 'Maker',
  category: 'panel',
  emittingAreaCm: { width: 30, height: 20 },
  ledCount: 60,
  nominalWavelengths: [],
  claims: { irradianceMwCm2: 75, atDistanceCm: 15, beamAngleDeg: null, beamAngleKind: null },
  price: null,
  powerW: null,
  links: [],
};

const claims: PublicReport['claims'] = [
  { key: 'irradiance', label: 'Irradiance at the centre', claimed: '75 mW/cm² at 15 cm', measured: '51.9 mW/cm² at 15 cm', ratio: 0.692, note: null },
  { key: 'emittingArea', label: 'Emitting area', claimed: '30 × 20 cm', measured: '659 cm² at or above 50 % of the peak at 30 cm', ratio: null, note: null },
];

describe('claimsForDisplay', () => {
  it('writes irradiance and area claims in the reader units', () => {
    const rows = claimsForDisplay({ claims, model, beamAngle: null }, si, 659);
    expect(rows[0].claimed).toBe('750 W/m² at 5.9 in');
    // 0.692 × 75 mW/cm² = 51.9 mW/cm² = 519 W/m².
    expect(rows[0].measured).toBe('519 W/m² at 5.9 in');
    expect(rows[1].claimed).toBe('11.8 × 7.9 in');
    // 659 cm² / 6.4516 cm² per in² = 102.1 in²; 30 cm = 11.8 in.
    expect(rows[1].measured).toBe('102 in² at or above 50 % of the peak at 11.8 in');
  });

  it('adds the fitted beam angle when the maker states none, and keeps text it cannot rewrite', () => {
    const surface = { ...model, claims: { ...model.claims, atDistanceCm: 0 } };
    const rows = claimsForDisplay(
      {
        claims: [{ ...claims[0], ratio: null, measured: 'not measured at that distance' }, claims[1]],
        model: surface,
        beamAngle: { fittedFullAngleDeg: 44.46, claimedFullAngleDeg: null, claimNearerAs: null, residualRms: 0.1 },
      },
      si,
      null,
    );
    expect(rows.map((r) => r.key)).toEqual(['irradiance', 'beamAngle', 'emittingArea']);
    expect(rows[0].claimed).toBe('750 W/m² at the surface');
    expect(rows[0].measured).toBe('not measured at that distance');
    expect(rows[1]).toMatchObject({ claimed: 'not stated', measured: '44.5° effective, fitted from the profiles and the falloff', ratio: null });
    expect(rows[2].measured).toBe('659 cm² at or above 50 % of the peak at 30 cm');
  });
});
