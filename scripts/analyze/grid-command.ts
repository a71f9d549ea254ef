/**
 * `analyze.ts grid [--footprint WxH] FILE`
 * Imports a meter-readings file (distance_cm, x_cm, y_cm, irradiance_mw_cm2) and prints one JSON
 * document: per plane (sorted by distance) the peak, centre, spread widths at 80/50/25 % and,
 * with --footprint, uniformity over the emitting area; plus the falloff exponent of the centres.
 * Exit codes: 0 file usable (importer warnings go to stderr and into "issues"), 1 file not usable
 * (missing, unreadable, rejected by the importer, no readings), 2 bad command line.
 */
import { parseCommandLine, readInputFile, tidy } from './cli-io.ts';
import { decodeTextBytes } from '#shared/measurement/import/decode-text.ts';
import type { ImportIssue } from '#shared/measurement/import/import-issue.ts';
import { importMeterReadings, type MeterReading } from '#shared/measurement/import/meter-readings-import.ts';
import { falloffExponent } from '#shared/measurement/distance/falloff.ts';
import { analyzePlane } from '#shared/measurement/plane/analyze-plane.ts';
import { groupPlanesByDistance } from '#shared/measurement/plane/group-planes.ts';
import type { FootprintCm } from '#shared/measurement/plane/uniformity.ts';

export const GRID_USAGE =
  'usage: analyze.ts grid [--footprint WxH] FILE\n' +
  '  FILE         meter readings with columns distance_cm, x_cm, y_cm, irradiance_mw_cm2\n' +
  '  --footprint  emitting area W × H in cm (e.g. 34x80, 34X80 or 34×80) for uniformity figures\n' +
  'Prints one JSON document. Exit 0: file usable; 1: file not usable; 2: bad command line.\n';

export interface GridPlaneReport {
  distanceCm: number;
  points: number;
  peakMwCm2: number | null;
  centerMwCm2: number | null;
  spreadWidthCm: { '80': number; '50': number; '25': number };
  widthAtEdge: number[];
  footprint: { minOverMean: number | null; minOverMax: number | null; cv: number | null; nonUniformityPct: number | null } | null;
}

export interface GridReport {
  file: string;
  planes: GridPlaneReport[];
  falloffExponent: number | null;
  issues: ImportIssue[];
}

/** `34x80`, `34 X 80`, `34×80`, `34.5x80` → cm; null when malformed or not positive. */
export function parseFootprintCm(text: string): FootprintCm | null {
  const m = /^\s*(\d+(?:\.\d+)?)\s*[xX×]\s*(\d+(?:\.\d+)?)\s*$/.exec(text);
  if (!m) return null;
  const widthCm = Number(m[1]);
  const heightCm = Number(m[2]);
  return widthCm > 0 && heightCm > 0 ? { widthCm, heightCm } : null;
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

/** The JSON report for readings already imported (pure: no I/O). */
export function buildGridReport(
  file: string,
  readings: readonly MeterReading[],
  footprint: FootprintCm | null,
  issues: ImportIssue[] = [],
): GridReport {
  const planes = groupPlanesByDistance(readings).map(({ distanceCm, readings: rs }): GridPlaneReport => {
    const a = analyzePlane(
      rs.map((r) => ({ xCm: r.xCm, yCm: r.yCm, value: r.irradianceMwCm2 })),
      footprint ? { footprint, levelsPct: [80, 50, 25] } : { levelsPct: [80, 50, 25] },
    );
    const [w80, w50, w25] = a.spreadWidths.map((w) => tidy(w.widthCm));
    const fp = a.footprint;
    return {
      distanceCm: tidy(distanceCm),
      points: a.points,
      peakMwCm2: tidy(a.peak),
      centerMwCm2: tidy(a.center),
      spreadWidthCm: { '80': w80, '50': w50, '25': w25 },
      widthAtEdge: a.widthAtEdge,
      footprint: fp
        ? {
            minOverMean: tidy(fp.minOverMean),
            minOverMax: tidy(fp.minOverMax),
            cv: tidy(fp.cv),
            nonUniformityPct: tidy(fp.nonUniformityPct),
          }
        : null,
    };
  });
  const exponent = falloffExponent(planes.map((p) => ({ distanceCm: p.distanceCm, center: p.centerMwCm2 })));
  return { file, planes, falloffExponent: tidy(exponent), issues };
}

function formatIssue(file: string, i: ImportIssue): string {
  return `${file}${i.line === null ? '' : `:${i.line}`}: ${i.severity} ${i.code}: ${i.message}\n`;
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
  const decoded = decodeTextBytes(read.bytes);
  const result = importMeterReadings(decoded.text);
  const issues = [...decoded.issues, ...result.issues];
  for (const i of issues) process.stderr.write(formatIssue(file, i));
  if (!result.ok) {
    process.stderr.write(`analyze grid: ${file} cannot be used: the importer rejected it (see the issues above).\n`);
    return 1;
  }
  if (result.readings.length === 0) {
    process.stderr.write(`analyze grid: ${file} has no readings.\n`);
    return 1;
  }
  const report = buildGridReport(file, result.readings, footprint, issues);
  process.stdout.write(`${JSON.stringify(report, null, 2)}\n`);
  return 0;
}
