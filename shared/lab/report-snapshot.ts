/**
 * What a published report shows, computed once from its runs and frozen with the version: the
 * figures per plane and band, the readings for the maps, a representative spectrum, the claims
 * against the measurements, the dose table, the uncertainty statement and the infrared eye
 * screening, and for a report over several units the unit-to-unit spread. Pure and deterministic,
 * so a preview and the published version are the same numbers.
 */
import { minorDigits } from '../money/money.ts';
import { analyzeGrid } from '../measurement/check/analyze-grid.ts';
import { fitEffectiveBeamAngle, type BeamAngleFit } from '../measurement/distance/beam-angle.ts';
import { centerAtDistance, pointFalloffExponentAt, pointFalloffExponents } from '../measurement/distance/falloff.ts';
import { doseTimesByPlane, DEFAULT_DOSE_TARGETS_JCM2, type PlaneDoseTimes } from '../measurement/dose/radiant-exposure.ts';
import { screenIrEyeFromSpectrum } from '../measurement/safety/infrared-eye-spectrum.ts';
import { findEmissionPeaks } from '../measurement/spectral/emission-peaks.ts';
import { irradianceUncertaintyBudget, type IrradianceBudget } from '../measurement/uncertainty/budget.ts';
import { COMBINED_BAND } from './band-values.ts';
import type { GridPoint } from './grid-point.ts';
import { runFigures, type PointValues, type RunPlaneFigures } from './run-figures.ts';

export interface SnapshotInstrument {
  name: string;
  kind: 'spectroradiometer' | 'irradiance_meter';
  serial: string;
  wavelengthRangeNm: { from: number; to: number } | null;
  cosineCorrector: string | null;
  calibratedOn: string;
  calibrationDueOn: string;
  calibrationUncertaintyPct: number;
}

export interface SnapshotModel {
  name: string;
  makerName: string;
  category: string;
  emittingAreaCm: { width: number; height: number };
  ledCount: number | null;
  nominalWavelengths: { nm: number; sharePct: number | null }[];
  claims: { irradianceMwCm2: number | null; atDistanceCm: number | null; beamAngleDeg: number | null; beamAngleKind: 'full' | 'half' | null };
  price: { amountMinor: number; currency: string } | null;
  powerW: number | null;
  links: string[];
}

export interface SnapshotRunInput {
  unit: { serial: string; obtained: string; receivedOn: string | null; firmware: string | null };
  instrument: SnapshotInstrument;
  grid: { distancesCm: number[]; xCm: number[]; yCm: number[] };
  bands: Record<string, { loNm: number; hiNm: number }>;
  conditions: { roomTempC: number | null; warmupMinutes: number | null; mainsVoltageV: number | null };
  measuredOn: string;
  measuredBy: string;
  /** Grid readings used in the figures (analysed, not excluded), mW/cm² per band and combined. */
  readings: PointValues[];
  /** Start and end centre readings per distance (combined band), for repeatability. */
  centerChecks: { distanceCm: number; values: number[] }[];
  /** The centre spectrum at the nearest distance, W/m²/nm; null for a meter run. */
  spectrum: { distanceCm: number; xCm: number; yCm: number; wavelengthNm: number[]; irradianceWm2Nm: number[] } | null;
}

export interface ClaimRow {
  key: 'irradiance' | 'beamAngle' | 'emittingArea';
  label: string;
  claimed: string;
  measured: string;
  /** measured ÷ claimed where both are numbers of one kind; null otherwise. */
  ratio: number | null;
  note: string | null;
}

export interface UnitSpreadRow {
  figure: string;
  unit: string;
  values: { serial: string; value: number | null }[];
  min: number | null;
  max: number | null;
  /** (max − min) / mean × 100. */
  spreadPct: number | null;
}

export interface KeyFigures {
  centerMwCm2At15: number | null;
  centerMwCm2At30: number | null;
  /** Red share of red + near-infrared at the centre of the nearest plane, %. */
  redSharePct: number | null;
  spread50CmAt15: number | null;
  /** Area-weighted U₀ over the emitting area at the nearest plane. */
  footprintUniformity: number | null;
  measuredOverClaimed: number | null;
  /** Price per 100 cm² of area at ≥ 50 % of the peak at 30 cm, in the price's currency (major units). */
  pricePer100Cm2At30: number | null;
  currency: string | null;
}

export interface ReportSnapshot {
  model: SnapshotModel;
  units: (SnapshotRunInput['unit'] & { measuredOn: string; measuredBy: string; instrument: SnapshotInstrument; conditions: SnapshotRunInput['conditions'] })[];
  instrument: SnapshotInstrument;
  grid: SnapshotRunInput['grid'];
  bands: Record<string, { loNm: number; hiNm: number }>;
  planes: RunPlaneFigures[];
  falloffExponent: Record<string, number | null>;
  pointExponents: { distanceCm: number; exponent: number }[];
  readings: { unitSerial: string; distanceCm: number; xCm: number; yCm: number; values: Record<string, number | null> }[];
  spectrum: (NonNullable<SnapshotRunInput['spectrum']> & { peaks: { peakNm: number; fwhmNm: number | null; centroidNm: number | null }[] }) | null;
  beamAngle: Pick<BeamAngleFit, 'fittedFullAngleDeg' | 'claimedFullAngleDeg' | 'claimNearerAs' | 'residualRms'> | null;
  claims: ClaimRow[];
  doseTargetsJCm2: number[];
  doseTable: PlaneDoseTimes[];
  uncertainty: (IrradianceBudget & { distanceCm: number; statement: string }) | null;
  irScreening: {
    distanceCm: number;
    measuredWm2: number | null;
    maxSecondsMeasured: number | null;
    reason: string | null;
    upperBoundWm2: number | null;
    maxSecondsAtUpperBound: number | null;
    note: string | null;
  } | null;
  unitSpread: UnitSpreadRow[] | null;
  keyFigures: KeyFigures;
}

const r3 = (v: number) => Number(v.toPrecision(3));
const near = (a: number, b: number) => Math.abs(a - b) < 1e-6;

/** Positioning uncertainty of the bench rail, standard (k = 1), cm (common practice, no source). */
export const DISTANCE_UNCERTAINTY_CM = 0.5;

function centers(planes: readonly RunPlaneFigures[], band: string): { distanceCm: number; center: number | null }[] {
  return planes.map((p) => ({ distanceCm: p.distanceCm, center: p.bands[band]?.centerMwCm2 ?? null }));
}

function fitBeam(model: SnapshotModel, readings: readonly PointValues[]): BeamAngleFit | null {
  const area = model.emittingAreaCm.width * model.emittingAreaCm.height;
  const pitchCm = model.ledCount && model.ledCount > 0 ? Math.sqrt(area / model.ledCount) : 2;
  const used = readings
    .filter((r) => (r.values[COMBINED_BAND] ?? 0) > 0)
    .map((r) => ({ distanceCm: r.distanceCm, xCm: r.xCm, yCm: r.yCm, irradiance: r.values[COMBINED_BAND] as number }));
  const claim =
    model.claims.beamAngleDeg && model.claims.beamAngleKind
      ? { angleDeg: model.claims.beamAngleDeg, statesHalfAngle: model.claims.beamAngleKind === 'half' }
      : null;
  return fitEffectiveBeamAngle({ widthCm: model.emittingAreaCm.width, heightCm: model.emittingAreaCm.height, pitchCm }, used, claim);
}

function uncertaintyAt(run: SnapshotRunInput, planes: readonly RunPlaneFigures[]): ReportSnapshot['uncertainty'] {
  if (planes.length === 0) return null;
  const distanceCm = planes.some((p) => near(p.distanceCm, 30)) ? 30 : planes[0].distanceCm;
  const exponent = pointFalloffExponentAt(centers(planes, COMBINED_BAND), distanceCm);
  const repeats = run.centerChecks.find((c) => near(c.distanceCm, distanceCm))?.values ?? [];
  const budget = irradianceUncertaintyBudget({
    // Calibration certificates state an expanded uncertainty at k = 2 (common practice, no source).
    calibrationRelative: run.instrument.calibrationUncertaintyPct / 100 / 2,
    distance: exponent ? { localExponent: exponent.exponent, distanceCm, distanceUncertaintyCm: DISTANCE_UNCERTAINTY_CM } : null,
    repeatReadings: repeats.length >= 2 ? repeats : null,
    // Typical values for a cosine-corrected bench instrument (from memory).
    extra: [
      { key: 'cosine', label: 'Cosine response', relative: 0.01 },
      { key: 'stray_light', label: 'Stray light and linearity', relative: 0.005 },
    ],
  });
  const pct = (v: number) => `${r3(v * 100)} %`;
  const nu = budget.effectiveDegreesOfFreedom === null ? 'effective degrees of freedom infinite' : `ν_eff = ${r3(budget.effectiveDegreesOfFreedom)}`;
  return {
    ...budget,
    distanceCm,
    statement: `Irradiance at ${distanceCm} cm: expanded relative uncertainty U = ${pct(budget.expandedRelative)} (k = ${r3(budget.coverageFactor)}, ${nu}; about 95 % coverage), from a combined standard uncertainty of ${pct(budget.combinedRelative)}.`,
  };
}

function claimRows(model: SnapshotModel, planes: readonly RunPlaneFigures[], beam: BeamAngleFit | null, area50At30: number | null): { rows: ClaimRow[]; ratio: number | null } {
  const rows: ClaimRow[] = [];
  let ratio: number | null = null;
  const c = model.claims;
  if (c.irradianceMwCm2 !== null) {
    const at = c.atDistanceCm ?? 0;
    const measured = at > 0 ? centerAtDistance(centers(planes, COMBINED_BAND), at) : null;
    ratio = measured === null ? null : measured / c.irradianceMwCm2;
    rows.push({
      key: 'irradiance',
      label: 'Irradiance at the centre',
      claimed: `${r3(c.irradianceMwCm2)} mW/cm² ${at > 0 ? `at ${r3(at)} cm` : 'at the surface'}`,
      measured: measured === null ? 'not measured at that distance' : `${r3(measured)} mW/cm² at ${r3(at)} cm`,
      ratio,
      note:
        at > 0
          ? planes.some((p) => near(p.distanceCm, at))
            ? null
            : 'Between measured distances: interpolated on the measured falloff.'
          : 'The claim is for the surface; Benchlight does not measure in contact or extrapolate to it.',
    });
  }
  if (c.beamAngleDeg !== null && beam) {
    rows.push({
      key: 'beamAngle',
      label: 'Beam angle (full angle at half intensity)',
      claimed: `${r3(c.beamAngleDeg)}° (${c.beamAngleKind === 'half' ? 'stated as a half angle' : 'stated as a full angle'})`,
      measured: `${r3(beam.fittedFullAngleDeg)}° effective, fitted from the profiles and the falloff`,
      ratio: beam.claimedFullAngleDeg ? beam.fittedFullAngleDeg / beam.claimedFullAngleDeg : null,
      note: beam.claimNearerAs && beam.claimNearerAs !== (c.beamAngleKind ?? 'full') ? `The printed number fits better read as a ${beam.claimNearerAs} angle.` : null,
    });
  }
  rows.push({
    key: 'emittingArea',
    label: 'Emitting area',
    claimed: `${r3(model.emittingAreaCm.width)} × ${r3(model.emittingAreaCm.height)} cm`,
    measured: area50At30 === null ? 'no plane at 30 cm' : `${r3(area50At30)} cm² at or above 50 % of the peak at 30 cm`,
    ratio: null,
    note: null,
  });
  return { rows, ratio };
}

function spreadRows(runs: readonly SnapshotRunInput[], footprint: { widthCm: number; heightCm: number }): UnitSpreadRow[] | null {
  if (runs.length < 2) return null;
  const perRun = runs.map((run) => runFigures(run.readings, [COMBINED_BAND], footprint));
  const figure = (label: string, unit: string, get: (f: ReturnType<typeof runFigures>) => number | null): UnitSpreadRow => {
    const values = perRun.map((f, i) => ({ serial: runs[i].unit.serial, value: get(f) }));
    const nums = values.map((v) => v.value).filter((v): v is number => v !== null);
    const min = nums.length ? Math.min(...nums) : null;
    const max = nums.length ? Math.max(...nums) : null;
    const mean = nums.length ? nums.reduce((s, v) => s + v, 0) / nums.length : null;
    return { figure: label, unit, values, min, max, spreadPct: min !== null && max !== null && mean ? ((max - min) / mean) * 100 : null };
  };
  const at = (f: ReturnType<typeof runFigures>, d: number) => f.planes.find((p) => near(p.distanceCm, d))?.bands[COMBINED_BAND] ?? null;
  const distances = runs[0].grid.distancesCm;
  return [
    ...distances.map((d) => figure(`Centre irradiance at ${d} cm`, 'mW/cm²', (f) => at(f, d)?.centerMwCm2 ?? null)),
    ...distances.map((d) => figure(`50 % spread width at ${d} cm`, 'cm', (f) => at(f, d)?.spreadWidthCm['50'] ?? null)),
    figure('Falloff exponent', '', (f) => f.falloffExponent[COMBINED_BAND] ?? null),
  ];
}

export function buildReportSnapshot(model: SnapshotModel, runs: readonly SnapshotRunInput[]): ReportSnapshot {
  if (runs.length === 0) throw new RangeError('a report needs at least one run');
  const primary = runs[0];
  const bandNames = [COMBINED_BAND, ...Object.keys(primary.bands)];
  const footprint = { widthCm: model.emittingAreaCm.width, heightCm: model.emittingAreaCm.height };
  const figures = runFigures(primary.readings, bandNames, footprint);
  const combinedGrid = analyzeGrid(
    primary.readings.filter((r) => r.values[COMBINED_BAND] !== null).map((r) => ({ distanceCm: r.distanceCm, xCm: r.xCm, yCm: r.yCm, value: r.values[COMBINED_BAND] as number })),
    { footprint },
  );
  const plane30 = combinedGrid.planes.find((p) => near(p.distanceCm, 30));
  const area50At30 = plane30?.coverage.isolines.find((i) => i.levelPct === 50)?.areaCm2 ?? null;
  const beam = fitBeam(model, primary.readings);
  const claims = claimRows(model, figures.planes, beam, area50At30);
  const nearest = figures.planes[0];

  let spectrum: ReportSnapshot['spectrum'] = null;
  let irScreening: ReportSnapshot['irScreening'] = null;
  if (primary.spectrum) {
    const s = { wavelengthNm: primary.spectrum.wavelengthNm, irradianceWm2Nm: primary.spectrum.irradianceWm2Nm };
    spectrum = {
      ...primary.spectrum,
      peaks: findEmissionPeaks(s).map((p) => ({ peakNm: p.peakNm, fwhmNm: p.fwhmNm, centroidNm: p.centroidNm })),
    };
    const screening = screenIrEyeFromSpectrum(s);
    irScreening = {
      distanceCm: primary.spectrum.distanceCm,
      measuredWm2: screening.band.measuredWm2,
      maxSecondsMeasured: screening.measured?.maxSeconds ?? null,
      reason: screening.measured?.reason ?? null,
      upperBoundWm2: screening.band.upperBoundWm2,
      maxSecondsAtUpperBound: screening.atUpperBound?.maxSeconds ?? null,
      note: screening.band.note,
    };
  }

  const centerAt = (d: number) => centerAtDistance(centers(figures.planes, COMBINED_BAND), d);
  const red = nearest?.bands.red?.centerMwCm2 ?? null;
  const nir = nearest?.bands.nir?.centerMwCm2 ?? null;
  const price = model.price;
  const keyFigures: KeyFigures = {
    centerMwCm2At15: centerAt(15) ?? (nearest && near(nearest.distanceCm, 15) ? nearest.bands[COMBINED_BAND]?.centerMwCm2 ?? null : null),
    centerMwCm2At30: centerAt(30),
    redSharePct: red !== null && nir !== null && red + nir > 0 ? (red / (red + nir)) * 100 : null,
    spread50CmAt15: figures.planes.find((p) => near(p.distanceCm, 15))?.bands[COMBINED_BAND]?.spreadWidthCm['50'] ?? null,
    footprintUniformity: nearest?.bands[COMBINED_BAND]?.footprintArea?.minOverMean ?? null,
    measuredOverClaimed: claims.ratio,
    pricePer100Cm2At30: price && area50At30 && area50At30 > 0 ? price.amountMinor / 10 ** minorDigits(price.currency) / (area50At30 / 100) : null,
    currency: price?.currency ?? null,
  };

  return {
    model,
    units: runs.map((r) => ({ ...r.unit, measuredOn: r.measuredOn, measuredBy: r.measuredBy, instrument: r.instrument, conditions: r.conditions })),
    instrument: primary.instrument,
    grid: primary.grid,
    bands: primary.bands,
    planes: figures.planes,
    falloffExponent: figures.falloffExponent,
    pointExponents: pointFalloffExponents(centers(figures.planes, COMBINED_BAND)).map((p) => ({ distanceCm: p.distanceCm, exponent: p.exponent })),
    readings: runs.flatMap((r) => r.readings.map((p) => ({ unitSerial: r.unit.serial, distanceCm: p.distanceCm, xCm: p.xCm, yCm: p.yCm, values: { ...p.values } }))),
    spectrum,
    beamAngle: beam ? { fittedFullAngleDeg: beam.fittedFullAngleDeg, claimedFullAngleDeg: beam.claimedFullAngleDeg, claimNearerAs: beam.claimNearerAs, residualRms: beam.residualRms } : null,
    claims: claims.rows,
    doseTargetsJCm2: [...DEFAULT_DOSE_TARGETS_JCM2],
    doseTable: doseTimesByPlane(
      figures.planes.map((p) => ({ distanceCm: p.distanceCm, centerMwCm2: p.bands[COMBINED_BAND]?.centerMwCm2 ?? null, peakMwCm2: p.bands[COMBINED_BAND]?.peakMwCm2 ?? null })),
    ),
    uncertainty: uncertaintyAt(primary, figures.planes),
    irScreening,
    unitSpread: spreadRows(runs, footprint),
    keyFigures,
  };
}

/** Readings of the primary unit of a snapshot for one band, as grid points for the maps. */
export function snapshotPoints(snapshot: Pick<ReportSnapshot, 'readings' | 'units'>, band: string): (GridPoint & { value: number })[] {
  const serial = snapshot.units[0]?.serial;
  return snapshot.readings
    .filter((r) => r.unitSerial === serial && r.values[band] !== null && r.values[band] !== undefined)
    .map((r) => ({ distanceCm: r.distanceCm, xCm: r.xCm, yCm: r.yCm, value: r.values[band] as number }));
}
