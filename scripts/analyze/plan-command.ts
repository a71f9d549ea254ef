/**
 * `analyze.ts plan --dose J_CM2 (--target WxH | --zones A+B [--body SIZE]) [options] FILE`
 * Plans sessions for the unit measured in a meter-readings file (distance_cm, x_cm, y_cm,
 * irradiance_mw_cm2), read through the shared check pipeline, with the shared planner: per
 * strategy and distance, where the unit goes and for how many minutes to bring a share of the
 * target to the dose. Prints {"plans":[…]} ranked by total minutes; plans that cannot be made are
 * named on stderr. Arithmetic on measurements, not treatment advice.
 * Exit codes: 0 file usable, 1 file not usable, 2 bad command line.
 */
import { formatIssue, parseCommandLine, readInputFile, tidy, withCliHint } from './cli-io.ts';
import { checkMeterReadingsFile } from '#shared/measurement/check/check-meter-readings-file.ts';
import { parseFootprintCm } from '#shared/measurement/check/footprint-text.ts';
import { bodyOverlay, type BodyZoneName } from '#shared/measurement/plane/body-outline.ts';
import { BODY_SIZE_PRESETS, type BodySizePreset } from '#shared/measurement/planner/body-sizes.ts';
import { loadHighsSolver } from '#shared/measurement/planner/highs-solver.ts';
import { planSession } from '#shared/measurement/planner/plan-session.ts';
import { SAMPLE_STEP_CM, isSampleMultiple } from '#shared/measurement/planner/target-samples.ts';
import {
  PLAN_STRATEGIES,
  type PlannerCaps,
  type PlannerTarget,
  type PlanStrategy,
  type SessionPlan,
  type SessionPlanInput,
} from '#shared/measurement/planner/types.ts';

const ZONE_NAMES = bodyOverlay().zones.map((z) => z.name);

export const PLAN_USAGE =
  'usage: analyze.ts plan --dose J_CM2 --target WxH [options] FILE\n' +
  '       analyze.ts plan --dose J_CM2 --zones NAME+NAME [--body SIZE] [options] FILE\n' +
  '  FILE              meter readings with columns distance_cm, x_cm, y_cm, irradiance_mw_cm2\n' +
  '  --dose            target dose H* in J/cm²\n' +
  `  --target          a W × H cm rectangle centred on the grid origin, W and H multiples of ${SAMPLE_STEP_CM} (e.g. 40x30)\n` +
  `  --zones           body zones instead: ${ZONE_NAMES.join(', ')} (joined with + or ,)\n` +
  '  --body            body size for --zones: small, medium (default), large, or SHOULDERxHEIGHT in cm\n' +
  '  --cover           share of the target to reach H*, 0 < F ≤ 1 (default 0.9)\n' +
  '  --dose-cap        highest dose as a multiple of H* (default 3; "none" for no cap)\n' +
  '  --max-irradiance  highest irradiance on the target, mW/cm² (default none)\n' +
  '  --max-minutes     longest time at one position, minutes (default none)\n' +
  '  --strategy        single, placements or units (default all three)\n' +
  "  --unit-size       the unit's emitting area W × H cm, for units side by side (default read from the nearest plane)\n" +
  'Prints one JSON document. Exit 0: file usable; 1: file not usable; 2: bad command line.\n' +
  'Plans are arithmetic on measurements, not treatment advice.\n';

const OPTIONS = ['dose', 'target', 'zones', 'body', 'cover', 'dose-cap', 'max-irradiance', 'max-minutes', 'strategy', 'unit-size'] as const;

export interface PlanReportPlan {
  strategy: PlanStrategy;
  distanceCm: number;
  interpolated: boolean;
  positions: { xCm: number; yCm: number; minutes: number }[];
  units: number;
  totalMinutes: number;
  coveredShare: number;
  outsideGridShare: number;
  doseJCm2: { min: number | null; mean: number | null; max: number | null };
  overCapShare: number;
}

type ParsedArgs =
  | { ok: true; help: true }
  | { ok: true; help: false; file: string; input: Omit<SessionPlanInput, 'planes'> }
  | { ok: false; message: string };

/** A positive number as typed (`10`, `0.9`, `2.5`), or null. */
function positive(text: string): number | null {
  const t = text.trim();
  if (!/^\d+(?:\.\d+)?$/.test(t)) return null;
  const v = Number(t);
  return v > 0 ? v : null;
}

function readTarget(values: Partial<Record<(typeof OPTIONS)[number], string>>): PlannerTarget | string {
  if (values.target !== undefined && values.zones !== undefined) return 'give --target or --zones, not both';
  if (values.target !== undefined) {
    if (values.body !== undefined) return '--body goes with --zones, not with --target';
    const size = parseFootprintCm(values.target);
    if (!size) return `--target "${values.target}" is not W×H in cm (e.g. 40x30)`;
    if (!isSampleMultiple(size.widthCm) || !isSampleMultiple(size.heightCm)) {
      return `--target "${values.target}": W and H must be multiples of ${SAMPLE_STEP_CM} cm (the target is sampled on ${SAMPLE_STEP_CM} cm cells)`;
    }
    return { kind: 'rectangle', widthCm: size.widthCm, heightCm: size.heightCm };
  }
  if (values.zones === undefined) return 'no target: give --target WxH or --zones';
  const zones = values.zones.split(/[+,]/).map((z) => z.trim());
  const unknown = zones.filter((z) => !(ZONE_NAMES as string[]).includes(z));
  if (unknown.length > 0 || zones.length === 0) return `--zones: unknown zone "${unknown[0] ?? ''}" (zones: ${ZONE_NAMES.join(', ')})`;
  const bodyText = values.body ?? 'medium';
  const preset = BODY_SIZE_PRESETS[bodyText as BodySizePreset];
  const custom = preset ? null : parseFootprintCm(bodyText);
  if (!preset && !custom) return `--body "${bodyText}" is not small, medium, large or SHOULDERxHEIGHT in cm`;
  const body = preset ?? { shoulderWidthCm: custom!.widthCm, heightCm: custom!.heightCm };
  return { kind: 'zones', zones: [...new Set(zones)] as BodyZoneName[], body };
}

function parseOptions(args: string[]): ParsedArgs {
  const cl = parseCommandLine(args, OPTIONS);
  if (!cl.ok) return cl;
  if (cl.help) return { ok: true, help: true };
  const v = cl.values;
  if (v.dose === undefined) return { ok: false, message: 'no --dose given' };
  const doseJCm2 = positive(v.dose);
  if (doseJCm2 === null) return { ok: false, message: `--dose "${v.dose}" is not a positive number of J/cm²` };
  const target = readTarget(v);
  if (typeof target === 'string') return { ok: false, message: target };
  let coverShare: number | undefined;
  if (v.cover !== undefined) {
    const f = positive(v.cover);
    if (f === null || f > 1) return { ok: false, message: `--cover "${v.cover}" is not a share 0 < F ≤ 1 (e.g. 0.9)` };
    coverShare = f;
  }
  const caps: PlannerCaps = {};
  if (v['dose-cap'] !== undefined) {
    const m = v['dose-cap'] === 'none' ? null : positive(v['dose-cap']);
    if (m !== null && m < 1) return { ok: false, message: `--dose-cap "${v['dose-cap']}" is below 1 × H*` };
    if (m === null && v['dose-cap'] !== 'none') return { ok: false, message: `--dose-cap "${v['dose-cap']}" is not a multiple of H* (e.g. 3) or "none"` };
    caps.maxDoseMultiple = m;
  }
  for (const [name, key] of [['max-irradiance', 'maxIrradianceMwCm2'], ['max-minutes', 'maxMinutesPerPosition']] as const) {
    if (v[name] === undefined) continue;
    const cap = positive(v[name]);
    if (cap === null) return { ok: false, message: `--${name} "${v[name]}" is not a positive number` };
    caps[key] = cap;
  }
  let strategies: PlanStrategy[] | undefined;
  if (v.strategy !== undefined) {
    if (!(PLAN_STRATEGIES as string[]).includes(v.strategy)) return { ok: false, message: `--strategy "${v.strategy}" is not single, placements or units` };
    strategies = [v.strategy as PlanStrategy];
  }
  let unitSizeCm: SessionPlanInput['unitSizeCm'];
  if (v['unit-size'] !== undefined) {
    unitSizeCm = parseFootprintCm(v['unit-size']);
    if (!unitSizeCm) return { ok: false, message: `--unit-size "${v['unit-size']}" is not W×H in cm` };
  }
  if (cl.files.length === 0) return { ok: false, message: 'no file given' };
  if (cl.files.length > 1) return { ok: false, message: `one file at a time (got ${cl.files.length})` };
  return { ok: true, help: false, file: cl.files[0], input: { target, doseJCm2, coverShare, caps, strategies, unitSizeCm } };
}

/** A plan as the CLI prints it (pure: no I/O). Keys keep their meaning across versions. */
export function planReport(plan: SessionPlan): PlanReportPlan {
  return {
    strategy: plan.strategy,
    distanceCm: tidy(plan.distanceCm),
    interpolated: plan.interpolated,
    positions: plan.positions.map((p) => ({ xCm: tidy(p.xCm), yCm: tidy(p.yCm), minutes: tidy(p.minutes) })),
    units: plan.units,
    totalMinutes: tidy(plan.totalMinutes),
    coveredShare: tidy(plan.coveredShare),
    outsideGridShare: tidy(plan.outsideGridShare),
    doseJCm2: { min: tidy(plan.doseJCm2.min), mean: tidy(plan.doseJCm2.mean), max: tidy(plan.doseJCm2.max) },
    overCapShare: tidy(plan.overCapShare),
  };
}

export async function runPlanCommand(args: string[]): Promise<number> {
  const parsed = parseOptions(args);
  if (!parsed.ok) {
    process.stderr.write(`analyze plan: ${parsed.message}\n${PLAN_USAGE}`);
    return 2;
  }
  if (parsed.help) {
    process.stdout.write(PLAN_USAGE);
    return 0;
  }
  const { file, input } = parsed;
  const read = await readInputFile(file, 'a meter-readings file');
  if ('problem' in read) {
    process.stderr.write(`analyze plan: ${read.problem}\n`);
    return 1;
  }
  const check = checkMeterReadingsFile(read.bytes);
  for (const i of check.issues.map(withCliHint)) process.stderr.write(formatIssue(file, i));
  if (!check.result?.ok || check.result.readings.length === 0) {
    process.stderr.write(`analyze plan: ${file} cannot be used: the importer rejected it (see the issues above).\n`);
    return 1;
  }
  const planes = check.planes.map((p) => ({ distanceCm: p.distanceCm, points: p.points }));
  const needsSolver = (input.strategies ?? PLAN_STRATEGIES).includes('placements');
  const result = planSession({ ...input, planes }, needsSolver ? await loadHighsSolver() : null);
  for (const s of result.skipped) {
    process.stderr.write(`analyze plan: no ${s.strategy} plan at ${tidy(s.distanceCm)} cm: ${s.reason}.\n`);
  }
  process.stdout.write(`${JSON.stringify({ plans: result.plans.map(planReport) }, null, 2)}\n`);
  return 0;
}
