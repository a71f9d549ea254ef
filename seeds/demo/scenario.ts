/**
 * The whole demo scenario as text: spectrum exports for every grid point of every run, one
 * meter-readings file per unit, and a manifest describing it all. Deterministic for a seed:
 * every file draws its noise from its own seed, so order does not matter.
 */
import type { ReceiverPoint } from '#shared/measurement/geometry/led-array.ts';
import { gridPresets } from '#shared/lab/grid-presets.ts';
import type { RunGrid } from '#shared/lab/grid-point.ts';
import {
  FORMAT_EXTENSION,
  FORMAT_UNIT,
  formatMeterReadings,
  formatSpectrumExport,
  type MeterReadingRow,
} from './export-formats.ts';
import { hashSeed, mulberry32, normalFrom } from './prng.ts';
import {
  addInstrumentNoise,
  modelSpectrumWm2nm,
  pixelWavelengthsNm,
  sampledLineShapes,
  siliconResponsivity,
  uniformWavelengthsNm,
} from './spectrum.ts';
import { unitIrradiance } from './device-irradiance.ts';
import {
  DEMO_INSTRUMENTS,
  DEMO_METER_ID,
  DEMO_RUN_INSTRUMENT,
  DEMO_UNITS,
  type DemoInstrument,
  type DemoUnit,
  type ExportFormat,
} from './catalog.ts';

export const DEMO_SEED = 20250304;

export interface DemoFile {
  /** Path relative to the output folder, with forward slashes. */
  path: string;
  text: string;
}

export interface ManifestSpectrumFile {
  path: string;
  distanceCm: number;
  xCm: number;
  yCm: number;
  format: ExportFormat;
  irradianceUnit: string;
}

export interface ManifestUnit {
  id: string;
  kind: DemoUnit['kind'];
  maker: string;
  model: string;
  serial: string;
  emittingArea: { widthCm: number; heightCm: number; axes: string };
  ledPitchCm: number;
  ledCount: number;
  ledLayout: DemoUnit['ledLayout'];
  ledMix: { peakNm: number; fwhmNm: number; powerFraction: number; band: 'red' | 'near-infrared' }[];
  claimedBeamAngle: DemoUnit['claimedBeamAngle'];
  claimedIrradiance: DemoUnit['claimedIrradiance'];
  /** The generating model's truth, for tests and checks; not a measurement. */
  generatingModel: { fullAngleDeg: number; centerMwCm2ByDistanceCm: Record<string, number> };
}

export interface ManifestRun {
  id: string;
  unitId: string;
  instrumentId: string;
  measuredOn: string;
  format: ExportFormat;
  irradianceUnit: string;
  grid: { distancesCm: number[]; xCm: number[]; yCm: number[] };
  files: ManifestSpectrumFile[];
  meterReadings: { path: string; instrumentId: string; format: 'meter-readings' };
}

export interface DemoManifest {
  generator: 'benchlight-demo';
  version: 1;
  seed: number;
  note: string;
  instruments: DemoInstrument[];
  units: ManifestUnit[];
  runs: ManifestRun[];
}

/** Working band split of photobiomodulation writing (a convention): red 600–700 nm, NIR 700–1100 nm. */
function bandOf(peakNm: number): 'red' | 'near-infrared' {
  return peakNm < 700 ? 'red' : 'near-infrared';
}

function wavelengthsFor(instrument: DemoInstrument): number[] {
  // The array spectrometer reports its pixel wavelengths; the others resample to 0.5 nm.
  return instrument.format === 'tab-counts-descending'
    ? pixelWavelengthsNm(1400, 345.2, 0.5121, -1.1e-5)
    : uniformWavelengthsNm(350, 1050, 0.5);
}

function clock(startSeconds: number): string {
  const h = Math.floor(startSeconds / 3600);
  const m = Math.floor((startSeconds % 3600) / 60);
  const s = startSeconds % 60;
  return [h, m, s].map((v) => String(v).padStart(2, '0')).join(':');
}

/** The lab's standard grid template for a unit's emitting area (what a tester picks for it). */
export function demoGrid(unit: DemoUnit): RunGrid {
  return gridPresets({ widthCm: unit.widthCm, heightCm: unit.heightCm }).find((p) => p.id === 'standard')!.grid;
}

function gridPoints(grid: RunGrid): ReceiverPoint[] {
  const points: ReceiverPoint[] = [];
  for (const distanceCm of grid.distancesCm) for (const yCm of grid.yCm) for (const xCm of grid.xCm) points.push({ xCm, yCm, distanceCm });
  return points;
}

function instrumentById(id: string): DemoInstrument {
  const found = DEMO_INSTRUMENTS.find((i) => i.id === id);
  if (!found) throw new Error(`unknown demo instrument ${id}`);
  return found;
}

export function buildDemoScenario(seed: number = DEMO_SEED): { manifest: DemoManifest; files: DemoFile[] } {
  const files: DemoFile[] = [];
  const units: ManifestUnit[] = [];
  const runs: ManifestRun[] = [];

  DEMO_UNITS.forEach((unit, unitIndex) => {
    const grid = demoGrid(unit);
    const points = gridPoints(grid);
    const instrument = instrumentById(DEMO_RUN_INSTRUMENT[unit.id]);
    const format = instrument.format as ExportFormat;
    const wavelengths = wavelengthsFor(instrument);
    const responsivity = wavelengths.map(siliconResponsivity);
    const shapes = sampledLineShapes(unit.emitters, wavelengths);
    const model = unitIrradiance(unit, points, seed);
    const runId = `${unit.id}-run1`;
    const measuredOn = `2026-10-${String(5 + unitIndex).padStart(2, '0')}`;
    const spectrumFiles: ManifestSpectrumFile[] = [];
    const center: Record<string, number> = {};

    points.forEach((p, index) => {
      if (p.xCm === 0 && p.yCm === 0) center[String(p.distanceCm)] = model.totalMwCm2[index];
      const gauss = normalFrom(mulberry32(hashSeed(`${seed}:${runId}:${p.distanceCm}:${p.xCm}:${p.yCm}`)));
      const clean = modelSpectrumWm2nm(shapes, model.perEmitterMwCm2[index]);
      const measured = addInstrumentNoise(clean, responsivity, gauss);
      const peak = Math.max(...clean);
      // Auto integration: the spectrometer fills about 45 000 of 65 535 counts at the peak.
      const integrationMs = Math.round(Math.min(5000, Math.max(4, 300 / peak)));
      let darkCounts: number[] | undefined;
      let rawCounts: number[] | undefined;
      if (format === 'tab-counts-descending') {
        const gain = 45000 / peak;
        darkCounts = wavelengths.map((_, i) => Math.round(980 + 6 * Math.sin(i / 37) + 4 * gauss()));
        rawCounts = measured.map((s, i) => Math.min(65535, Math.max(0, Math.round(darkCounts![i] + s * gain * responsivity[i]))));
      }
      const path = `spectra/${runId}/d${p.distanceCm}_x${p.xCm}_y${p.yCm}.${FORMAT_EXTENSION[format]}`;
      files.push({
        path,
        text: formatSpectrumExport(format, {
          instrument,
          wavelengthsNm: wavelengths,
          spectralWm2nm: measured,
          distanceCm: p.distanceCm,
          xCm: p.xCm,
          yCm: p.yCm,
          takenAt: `${measuredOn} ${clock(9 * 3600 + 30 * 60 + 25 * index)}`,
          integrationMs,
          darkCounts,
          rawCounts,
        }),
      });
      spectrumFiles.push({ path, distanceCm: p.distanceCm, xCm: p.xCm, yCm: p.yCm, format, irradianceUnit: FORMAT_UNIT[format] });
    });

    const meterGauss = normalFrom(mulberry32(hashSeed(`${seed}:${runId}:meter`)));
    const meterRows: MeterReadingRow[] = points.map((p, index) => ({
      ...p,
      irradianceMwCm2: model.totalMwCm2[index] * (1 + 0.01 * meterGauss()),
    }));
    const meterPath = `meter/${unit.id}-readings.csv`;
    files.push({ path: meterPath, text: formatMeterReadings(meterRows) });

    units.push({
      id: unit.id,
      kind: unit.kind,
      maker: unit.maker,
      model: unit.model,
      serial: unit.serial,
      emittingArea: { widthCm: unit.widthCm, heightCm: unit.heightCm, axes: 'width along x, height along y, centred on the grid origin' },
      ledPitchCm: unit.ledPitchCm,
      ledCount: model.ledCount,
      ledLayout: unit.ledLayout,
      ledMix: unit.emitters.map((e) => ({ peakNm: e.peakNm, fwhmNm: e.fwhmNm, powerFraction: e.powerFraction, band: bandOf(e.peakNm) })),
      claimedBeamAngle: unit.claimedBeamAngle,
      claimedIrradiance: unit.claimedIrradiance,
      generatingModel: { fullAngleDeg: unit.modelFullAngleDeg, centerMwCm2ByDistanceCm: center },
    });
    runs.push({
      id: runId,
      unitId: unit.id,
      instrumentId: instrument.id,
      measuredOn,
      format,
      irradianceUnit: FORMAT_UNIT[format],
      grid: { distancesCm: [...grid.distancesCm], xCm: [...grid.xCm], yCm: [...grid.yCm] },
      files: spectrumFiles,
      meterReadings: { path: meterPath, instrumentId: DEMO_METER_ID, format: 'meter-readings' },
    });
  });

  const manifest: DemoManifest = {
    generator: 'benchlight-demo',
    version: 1,
    seed,
    note: 'Fictional makers, models, serial numbers and instruments, generated from an LED-array model with noise.',
    instruments: DEMO_INSTRUMENTS.map((i) => ({ ...i })),
    units,
    runs,
  };
  return { manifest, files };
}
