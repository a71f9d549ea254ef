/**
 * `analyze.ts grid [--footprint WxH] FILE`
 * Checks a meter-readings file (distance_cm, x_cm, y_cm, irradiance_mw_cm2) through the shared
 * check pipeline and prints one JSON document: per plane (sorted by distance) the peak, centre,
 * spread widths at 80/50/25 % and, with --footprint, uniformity over the emitting area (`footprint`:
 * the readings inside it; `footprintArea`: the interpolated map, area-weighted, with its warnings);
 * plus the falloff exponent of the centres.
 * Exit codes: 0 file usable (importer warnings go to stderr and into "issues"), 1 file not usable
 * (missing, unreadable, rejected by the importer, no readings), 2 bad command line.
 */
import { formatIssue, parseCommandLine, readInputFile, withCliHint } from './cli-io.ts';
import type { ImportIssue } from '#shared/measurement/import/import-issue.ts';
import { checkMeterReadingsFile } from '#shared/measurement/check/check-meter-readings-file.ts';
import type { GridAnalysis } from '#shared/measurement/check/analyze-grid.ts';
import { parseFootprintCm } from '#shared/measurement/check/footprint-text.ts';
import { STANDARD_LEVELS_PCT } from '#shared/measurement/plane/levels.ts';
import type { FootprintCm } from '#shared/measurement/plane/uniformity.ts';
import { planeFigures, tidy, type PlaneFigures } from '#shared/measurement/check/grid-report.ts';

export const GRID_USAGE =
  'usage: analyze.ts grid [--footprint WxH] FILE\n' +
  '  FILE         meter readings with columns distance_cm, x_cm, y_cm, irradiance_mw_cm2\n' +
  '  --footprint  emitting area W × H in cm (e.g. 34x80, 34X80 or 34×80) for uniformity figures:\n' +
  '               "footprintArea" over the whole area (interpolated, area-weighted), "footprint" of the readings inside\n' +
  'Prints one JSON document. Exit 0: file usable; 1: file not usable; 2: bad command line.\n';

export interface GridPlaneReport extends PlaneFigures {
  distanceCm: number;
  points: number;
}

export interface GridReport {
  file: string;
  planes: GridPlaneReport[];
  falloffExponent: number | null;
  issues: ImportIssue[];
}

type ParsedArgs = { ok: true; help: boolean; file: string; footprint: FootprintCm | null } | { ok: false; message: string };

function parseOptions(args: string[]): ParsedArgs {
  const cl = parseCommandLine(args, ['footprint'] as const);
  if (!cl.ok) return cl;
  let footprint: FootprintCm | null = null;
  if (cl.values.footprint !== undefined) {
    footprint = parseFootprintCm(cl.values.footprint);
    if (!footprint) return { ok: false, message: `--footprint "${cl.values.footprint}" is not W×H in cm (e.g. 34x80)` };
  }
  if (cl.help) return { ok: true, help: true, file: '', footprint };
  if (cl.files.length === 0) return { ok: false, message: 'no file given' };
  if (cl.files.length > 1) return { ok: false, message: `one file at a time (got ${cl.files.length})` };
  return { ok: true, help: false, file: cl.files[0], footprint };
}

/** The JSON report of a grid already analysed (pure: no I/O). Keys keep their meaning across versions. */
export function buildGridReport(file: string, grid: GridAnalysis, issues: ImportIssue[] = []): GridReport {
  const planes = grid.planes.map((plane): GridPlaneReport => {
    const figures = planeFigures(plane);
    return {
      distanceCm: tidy(plane.distanceCm),
      points: plane.analysis.points,
      ...figures,
      footprintArea: figures.footprintArea ? { ...figures.footprintArea, issues: figures.footprintArea.issues.map(withCliHint) } : null,
    };
  });
  return { file, planes, falloffExponent: tidy(grid.falloff.exponent), issues };
}

export async function runGridCommand(args: string[]): Promise<number> {
  const parsed = parseOptions(args);
  if (!parsed.ok) {
    process.stderr.write(`analyze grid: ${parsed.message}\n${GRID_USAGE}`);
    return 2;
  }
  if (parsed.help) {
    process.stdout.write(GRID_USAGE);
    return 0;
  }
  const { file, footprint } = parsed;
  const read = await readInputFile(file, 'a meter-readings file');
  if ('problem' in read) {
    process.stderr.write(`analyze grid: ${read.problem}\n`);
    return 1;
  }
  const check = checkMeterReadingsFile(read.bytes, { footprint, levelsPct: STANDARD_LEVELS_PCT });
  const issues = check.issues.map(withCliHint);
  for (const i of issues) process.stderr.write(formatIssue(file, i));
  if (!check.result?.ok) {
    process.stderr.write(`analyze grid: ${file} cannot be used: the importer rejected it (see the issues above).\n`);
    return 1;
  }
  if (check.result.readings.length === 0) {
    process.stderr.write(`analyze grid: ${file} has no readings.\n`);
    return 1;
  }
  for (const plane of check.planes) {
    for (const i of plane.analysis.footprintArea?.issues ?? []) {
      process.stderr.write(`${file} (plane at ${tidy(plane.distanceCm)} cm): ${i.severity} ${i.code}: ${i.message}\n`);
    }
  }
  process.stdout.write(`${JSON.stringify(buildGridReport(file, check, issues), null, 2)}\n`);
  return 0;
}
