/**
 * `analyze.ts run [--footprint WxH] [--bands NAME=LO-HI,...] FILE...`
 * A whole run's spectrum files, mapped to grid points by their names (d<distance>_x<x>_y<y>.<ext>,
 * cm), through the same pipeline as an upload: each file checked, its band values integrated,
 * then per plane and band the `grid` command's figures and the falloff exponent per band. Prints
 * `{ planes:[{distanceCm, points, bands:{combined, …}}], falloffExponent:{…}, unmatched:[…], failed:[…] }`.
 * Exit codes: 0 every file usable, 1 some file unusable or unmatched (still reported), 2 bad command line.
 */
import { basename } from 'node:path';
import { COMBINED_BAND, bandValues } from '#shared/lab/band-values.ts';
import { pointFromFileName } from '#shared/lab/file-mapping.ts';
import { runFigures, type PointValues } from '#shared/lab/run-figures.ts';
import { checkSpectrumFile } from '#shared/measurement/check/check-spectrum-file.ts';
import { parseFootprintCm } from '#shared/measurement/check/footprint-text.ts';
import { DEFAULT_BANDS, parseBandList } from '#shared/measurement/spectral/band-list.ts';
import type { WavelengthBand } from '#shared/measurement/spectral/spectrum.ts';
import type { FootprintCm } from '#shared/measurement/plane/uniformity.ts';
import { parseCommandLine, readInputFile } from './cli-io.ts';

export const RUN_USAGE =
  'usage: analyze.ts run [--footprint WxH] [--bands NAME=LO-HI,...] FILE...\n' +
  '  FILE         spectrum files named d<distance>_x<x>_y<y>.<ext> (cm), e.g. d30_x-10_y0.csv\n' +
  '  --footprint  emitting area W × H in cm for uniformity figures (e.g. 80x34)\n' +
  '  --bands      bands, replacing the default red=600-700,nir=700-1100 (nm); "combined" is their union\n' +
  'Prints one JSON document. Exit 0: all files usable; 1: some file unusable or unmatched; 2: bad command line.\n';

type Parsed = { ok: true; help: boolean; files: string[]; footprint: FootprintCm | null; bands: Record<string, WavelengthBand> } | { ok: false; message: string };

function parseOptions(args: string[]): Parsed {
  const cl = parseCommandLine(args, ['footprint', 'bands'] as const);
  if (!cl.ok) return cl;
  let footprint: FootprintCm | null = null;
  if (cl.values.footprint !== undefined) {
    footprint = parseFootprintCm(cl.values.footprint);
    if (!footprint) return { ok: false, message: `--footprint "${cl.values.footprint}" is not W×H in cm (e.g. 80x34)` };
  }
  let bands: Record<string, WavelengthBand> = { ...DEFAULT_BANDS };
  if (cl.values.bands !== undefined) {
    const parsed = parseBandList(cl.values.bands);
    if (!parsed.ok) return { ok: false, message: `--bands: ${parsed.message}` };
    bands = parsed.bands;
  }
  if (!cl.help && cl.files.length === 0) return { ok: false, message: 'no file given' };
  return { ok: true, help: cl.help, files: cl.files, footprint, bands };
}

export async function runRunCommand(args: string[]): Promise<number> {
  const parsed = parseOptions(args);
  if (!parsed.ok) {
    process.stderr.write(`analyze run: ${parsed.message}\n${RUN_USAGE}`);
    return 2;
  }
  if (parsed.help) {
    process.stdout.write(RUN_USAGE);
    return 0;
  }
  const points: PointValues[] = [];
  const unmatched: string[] = [];
  const failed: { file: string; issues: unknown[] }[] = [];
  const bandNames = [COMBINED_BAND, ...Object.keys(parsed.bands)];
  for (const file of parsed.files) {
    const point = pointFromFileName(basename(file));
    if (!point || point.slot !== 'grid') {
      unmatched.push(file);
      continue;
    }
    const read = await readInputFile(file, 'a spectrum export');
    if ('problem' in read) {
      failed.push({ file, issues: [{ line: null, code: read.code, severity: 'error', message: read.problem }] });
      continue;
    }
    const check = checkSpectrumFile(read.bytes, { bands: parsed.bands });
    const spectrum = check.result?.spectrum;
    if (!check.ok || !spectrum) {
      failed.push({ file, issues: check.issues });
      continue;
    }
    const values = bandValues(spectrum, parsed.bands);
    points.push({ ...point, values: Object.fromEntries(bandNames.map((b) => [b, values[b]?.mwCm2 ?? null])) });
  }
  const figures = runFigures(points, bandNames, parsed.footprint);
  process.stdout.write(`${JSON.stringify({ ...figures, unmatched, failed }, null, 2)}\n`);
  return unmatched.length === 0 && failed.length === 0 ? 0 : 1;
}
