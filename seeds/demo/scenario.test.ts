import { describe, expect, it } from 'vitest';
import { buildDemoScenario, DEMO_SEED, type DemoFile } from './scenario.ts';
import { FORMAT_UNIT_CANONICAL } from './export-formats.ts';
import { lineFractionBetween } from './line-shapes.ts';
import { DEMO_UNITS } from './catalog.ts';
import { falloffExponent, localFalloffExponents } from '#shared/measurement/distance/falloff.ts';
import { fitEffectiveBeamAngle } from '#shared/measurement/distance/beam-angle.ts';
import { importSpectrum } from '#shared/measurement/import/spectrum-import.ts';
import { importMeterReadings } from '#shared/measurement/import/meter-readings-import.ts';
import { bandIrradianceWm2, totalIrradianceWm2 } from '#shared/measurement/spectral/band-irradiance.ts';

const { manifest, files } = buildDemoScenario(DEMO_SEED);
const byPath = new Map(files.map((f) => [f.path, f.text]));
const unitOf = (id: string) => manifest.units.find((u) => u.id === id)!;
const centerFile = (runIndex: number, distanceCm: number) =>
  manifest.runs[runIndex].files.find((f) => f.distanceCm === distanceCm && f.xCm === 0 && f.yCm === 0)!;

describe('demo scenario', () => {
  it('is deterministic for a seed and changes with the seed', () => {
    const again = buildDemoScenario(DEMO_SEED);
    expect(again.manifest).toEqual(manifest);
    expect(again.files.length).toBe(files.length);
    expect(again.files.every((f: DemoFile, i: number) => f.path === files[i].path && f.text === files[i].text)).toBe(true);
    const other = buildDemoScenario(DEMO_SEED + 1);
    expect(other.files[0].text).not.toBe(files[0].text);
  });

  it('writes every grid point of every run in all four export shapes, plus meter readings', () => {
    expect(manifest.units.length).toBeGreaterThanOrEqual(3);
    expect(new Set(manifest.runs.map((r) => r.format))).toEqual(
      new Set(['comma-preamble', 'semicolon-decimal-comma', 'tab-counts-descending', 'comma-bom']),
    );
    for (const run of manifest.runs) {
      expect(run.files.length).toBe(3 * 9 * 5);
      expect(run.files.every((f) => byPath.has(f.path))).toBe(true);
      expect(byPath.has(run.meterReadings.path)).toBe(true);
    }
    expect(files.length).toBe(manifest.runs.length * (135 + 1));
    // The manifest carries the statement that the scenario is fictional.
    expect(manifest.note).toMatch(/Fictional/);
  });

  it('writes the byte-level features of each shape', () => {
    const text = (i: number) => byPath.get(centerFile(i, 30).path)!;
    expect(text(0)).toMatch(/^Spectral irradiance export\n/);
    expect(text(0)).toContain('\nWavelength (nm),Irradiance (W/m2/nm)\n');
    expect(text(1)).toContain('\r\nWavelength [nm];Irradiance [\u00b5W/cm\u00b2/nm]\r\n');
    expect(text(1)).toMatch(/\r\n350,0;-?\d+,\d{4}\r\n/);
    expect(text(2)).toContain('wavelength_nm\tdark_counts\traw_counts\tirradiance_mW_m2_nm\n');
    const rows = text(2).split('\n').filter((l) => /^\d/.test(l)).map((l) => Number(l.split('\t')[0]));
    expect(rows[0]).toBeGreaterThan(rows[rows.length - 1]); // descending wavelengths
    expect(rows.length).toBeGreaterThan(1300);
    expect(text(3).charCodeAt(0)).toBe(0xfeff);
  });

  it('keeps centre irradiance at 15 cm in realistic ranges per kind of unit', () => {
    // Common practice, no source: body panel ~60–100, small panel ~40–60, mat ~15–30 mW/cm².
    const at15 = (id: string) => unitOf(id).generatingModel.centerMwCm2ByDistanceCm['15'];
    const range: Record<string, [number, number]> = {
      'body panel': [60, 100],
      'small panel': [40, 60],
      'flexible mat': [15, 30],
      'half-body panel': [40, 100],
    };
    for (const u of manifest.units) {
      expect(at15(u.id)).toBeGreaterThanOrEqual(range[u.kind][0]);
      expect(at15(u.id)).toBeLessThanOrEqual(range[u.kind][1]);
    }
  });

  it('makes the body panel fall off far slower than inverse square between 15 and 60 cm', () => {
    // Common practice, no source: a body panel's centre exponent is near 0.55 over 15–61 cm;
    // inverse square (2) only holds past 5× the largest dimension (IES Lighting Handbook).
    const body = manifest.units.find((u) => u.kind === 'body panel')!;
    const planes = Object.entries(body.generatingModel.centerMwCm2ByDistanceCm).map(([d, c]) => ({ distanceCm: Number(d), center: c }));
    const c = falloffExponent(planes)!;
    expect(c).toBeGreaterThan(0.3);
    expect(c).toBeLessThan(1);
    expect(localFalloffExponents(planes).every((l) => l.exponent < 2)).toBe(true);
  });

  it('lets the beam-angle fit recover each unit’s LED angle from its meter readings', () => {
    // Self-consistency of the cosⁿ array model with 1 % meter noise and LED bin spread (computed).
    for (const run of manifest.runs) {
      const unit = unitOf(run.unitId);
      const meter = importMeterReadings(byPath.get(run.meterReadings.path)!);
      expect(meter.ok).toBe(true);
      const fit = fitEffectiveBeamAngle(
        { widthCm: unit.emittingArea.widthCm, heightCm: unit.emittingArea.heightCm, pitchCm: unit.ledPitchCm },
        meter.readings.map((r) => ({ ...r, irradiance: r.irradianceMwCm2 })),
        unit.claimedBeamAngle,
      )!;
      expect(Math.abs(fit.fittedFullAngleDeg - unit.generatingModel.fullAngleDeg)).toBeLessThan(4);
    }
  });
});

describe('generated spectra through the importer and band integration', () => {
  it('imports every export shape with its unit and the model irradiance', () => {
    manifest.runs.forEach((run, i) => {
      const result = importSpectrum(byPath.get(centerFile(i, 30).path)!);
      expect(result.ok, `${run.format}: ${JSON.stringify({ ...result, spectrum: null })}`).toBe(true);
      expect(result.unit).toBe(FORMAT_UNIT_CANONICAL[run.format].canonical);
      // Integrated spectrum vs model centre irradiance (1 mW/cm² = 10 W/m²). The residual dark
      // offset (one draw per spectrum, σ = 4e-4 of the peak) integrates over the 700 nm range to
      // σ ≈ 0.28 × peak/total ≈ 0.9 % of the total for the narrowest demo lines; line wings
      // outside the range take ≤ 0.5 %. 3.5 % is about 4σ of that (computed from the noise model).
      const model = unitOf(run.unitId).generatingModel.centerMwCm2ByDistanceCm['30'];
      expect(totalIrradianceWm2(result.spectrum!) / 10 / model).toBeCloseTo(1, 1);
      expect(Math.abs(totalIrradianceWm2(result.spectrum!) / 10 / model - 1)).toBeLessThan(0.035);
    });
  });

  it('imports every file of every run', () => {
    for (const run of manifest.runs) {
      const bad = run.files.filter((f) => !importSpectrum(byPath.get(f.path)!).ok);
      expect(bad.map((f) => f.path)).toEqual([]);
    }
  });

  it('splits red 600–700 nm and near-infrared 700–1100 nm as the LED mix says', () => {
    // Working band split of photobiomodulation writing (a convention, no standard). Expected
    // shares from the line shapes' closed-form fractions (computed); the centre sees many LEDs,
    // so the interleaved colours average out to within about 1 %.
    manifest.runs.forEach((run, i) => {
      const unit = DEMO_UNITS.find((u) => u.id === run.unitId)!;
      const result = importSpectrum(byPath.get(centerFile(i, 30).path)!);
      const red = bandIrradianceWm2(result.spectrum!, { loNm: 600, hiNm: 700 }).wm2!;
      const nir = bandIrradianceWm2(result.spectrum!, { loNm: 700, hiNm: 1100 }).wm2!;
      const share = red / (red + nir);
      const nominalRed = unit.emitters.filter((e) => e.peakNm < 700).reduce((s, e) => s + e.powerFraction, 0);
      const expectedRed = unit.emitters.reduce((s, e) => s + e.powerFraction * lineFractionBetween(e, 600, 700), 0);
      const expectedNir = unit.emitters.reduce((s, e) => s + e.powerFraction * lineFractionBetween(e, 700, 1100), 0);
      expect(Math.abs(share - nominalRed)).toBeLessThan(0.02);
      expect(Math.abs(share - expectedRed / (expectedRed + expectedNir))).toBeLessThan(0.01);
    });
  });
});
