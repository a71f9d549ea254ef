/**
 * `analyze.ts spectrum [--bands NAME=LO-HI,...] [--unit UNIT] FILE...`
 * Imports each spectrum file and prints one JSON document with its band irradiances, total
 * irradiance, peak wavelength and photon flux (irradiance figures in W/m²). A band the file does
 * not reach at all has `wm2: null` (not measured, not zero) and a `band_not_measured` issue.
 * Exit codes: 0 every file usable, 1 any file not usable (still reported in the JSON),
 * 2 bad command line (unknown option or unit, malformed --bands, no file).
 */
import { parseCommandLine, readInputFile, tidy, withCliHint } from './cli-io.ts';
import { KNOWN_UNITS_HINT } from '#shared/measurement/import/spectrum-import.ts';
import { checkSpectrumFile } from '#shared/measurement/check/check-spectrum-file.ts';
import { parseSpectralUnit } from '#shared/measurement/import/unit-spelling.ts';
import type { ImportIssue } from '#shared/measurement/import/import-issue.ts';
import { DEFAULT_BANDS, parseBandList } from '#shared/measurement/spectral/band-list.ts';
import type { WavelengthBand } from '#shared/measurement/spectral/spectrum.ts';

export const SPECTRUM_USAGE =
  'usage: analyze.ts spectrum [--bands NAME=LO-HI,...] [--unit UNIT] FILE...\n' +
  '  --bands  bands to integrate, replacing the default red=600-700,nir=700-1100 (nm)\n' +
  `  --unit   unit of the irradiance column when the file does not say (${KNOWN_UNITS_HINT};\n` +
  '           other spellings such as "µW/cm²/nm" or "W m-2 nm-1" work too); overrides the file\n' +
  'Prints one JSON document. Exit 0: all files usable; 1: some file not usable; 2: bad command line.\n';

interface FileReport {
  file: string;
  ok: boolean;
  unit: string | null;
  samples: number;
  rangeNm: [number, number] | null;
  /** wm2 null: the band lies wholly outside the file's range, not measured (not zero). */
  bands: Record<string, { loNm: number; hiNm: number; wm2: number | null; partial: boolean }> | null;
  totalWm2: number | null;
  peakNm: number | null;
  photonFluxUmolM2S: number | null;
  issues: ImportIssue[];
}

interface Options {
  bands: Record<string, WavelengthBand>;
  unit: string | undefined;
  files: string[];
}

type ParsedArgs = { ok: true; help: boolean; options: Options } | { ok: false; message: string };

function parseOptions(args: string[]): ParsedArgs {
  const cl = parseCommandLine(args, ['bands', 'unit'] as const);
  if (!cl.ok) return cl;
  let bands: Record<string, WavelengthBand> = { ...DEFAULT_BANDS };
  const { unit } = cl.values;
  if (unit !== undefined && parseSpectralUnit(unit) === null) {
    return { ok: false, message: `unknown unit "${unit}"; use a spectral irradiance unit such as ${KNOWN_UNITS_HINT}` };
  }
  if (cl.values.bands !== undefined) {
    const parsed = parseBandList(cl.values.bands);
    if (!parsed.ok) return { ok: false, message: `--bands: ${parsed.message}` };
    bands = parsed.bands;
  }
  if (!cl.help && cl.files.length === 0) return { ok: false, message: 'no file given' };
  return { ok: true, help: cl.help, options: { bands, unit, files: cl.files } };
}

function failed(file: string, issues: ImportIssue[], unit: string | null = null): FileReport {
  return { file, ok: false, unit, samples: 0, rangeNm: null, bands: null, totalWm2: null, peakNm: null, photonFluxUmolM2S: null, issues };
}

async function reportFile(file: string, options: Options): Promise<FileReport> {
  const read = await readInputFile(file, 'a single spectrum');
  if ('problem' in read) return failed(file, [{ line: null, code: read.code, severity: 'error', message: read.problem }]);
  // The command line's --unit overrides what the file says (the tester knows their instrument).
  const check = checkSpectrumFile(read.bytes, { unit: options.unit, unitPolicy: 'override', bands: options.bands });
  const issues = check.issues.map(withCliHint);
  const summary = check.summary;
  if (!summary || !check.result) return failed(file, issues, check.result?.unit ?? null);
  const bands: FileReport['bands'] = {};
  for (const [name, b] of Object.entries(summary.bands)) bands[name] = { loNm: b.loNm, hiNm: b.hiNm, wm2: tidy(b.wm2), partial: b.partial };
  return {
    file,
    ok: true,
    unit: check.result.unit,
    samples: summary.samples,
    rangeNm: summary.rangeNm,
    bands,
    totalWm2: tidy(summary.totalWm2),
    peakNm: tidy(summary.peakNm),
    photonFluxUmolM2S: tidy(summary.photonFluxUmolM2S),
    issues,
  };
}

export async function runSpectrumCommand(args: string[]): Promise<number> {
  const parsed = parseOptions(args);
  if (!parsed.ok) {
    process.stderr.write(`analyze spectrum: ${parsed.message}\n${SPECTRUM_USAGE}`);
    return 2;
  }
  if (parsed.help) {
    process.stdout.write(SPECTRUM_USAGE);
    return 0;
  }
  const files: FileReport[] = [];
  for (const file of parsed.options.files) files.push(await reportFile(file, parsed.options));
  process.stdout.write(`${JSON.stringify({ files }, null, 2)}\n`);
  return files.every((f) => f.ok) ? 0 : 1;
}
