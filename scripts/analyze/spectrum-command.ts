/**
 * `analyze.ts spectrum [--bands NAME=LO-HI,...] [--unit UNIT] FILE...`
 * Imports each spectrum file and prints one JSON document with its band irradiances, total
 * irradiance, peak wavelength and photon flux (irradiance figures in W/m²).
 * Exit codes: 0 every file usable, 1 any file not usable (still reported in the JSON),
 * 2 bad command line (unknown option or unit, malformed --bands, no file).
 */
import { readFile, stat } from 'node:fs/promises';
import { importSpectrum, KNOWN_UNITS_HINT } from '../../shared/measurement/import/spectrum-import.ts';
import { decodeTextBytes } from '../../shared/measurement/import/decode-text.ts';
import { parseSpectralUnit } from '../../shared/measurement/import/unit-spelling.ts';
import type { ImportIssue } from '../../shared/measurement/import/import-issue.ts';
import { DEFAULT_BANDS, parseBandList } from '../../shared/measurement/spectral/band-list.ts';
import type { WavelengthBand } from '../../shared/measurement/spectral/spectrum.ts';
import { summariseSpectrum } from '../../shared/measurement/spectral/spectrum-summary.ts';

export const SPECTRUM_USAGE =
  'usage: analyze.ts spectrum [--bands NAME=LO-HI,...] [--unit UNIT] FILE...\n' +
  '  --bands  bands to integrate, replacing the default red=600-700,nir=700-1100 (nm)\n' +
  `  --unit   unit of the irradiance column when the file does not say (${KNOWN_UNITS_HINT};\n` +
  '           other spellings such as "µW/cm²/nm" or "W m-2 nm-1" work too); overrides the file\n' +
  'Prints one JSON document. Exit 0: all files usable; 1: some file not usable; 2: bad command line.\n';

/** Larger files are not spectra from a bench instrument. */
const MAX_FILE_BYTES = 64 * 1024 * 1024;

interface FileReport {
  file: string;
  ok: boolean;
  unit: string | null;
  samples: number;
  rangeNm: [number, number] | null;
  bands: Record<string, { loNm: number; hiNm: number; wm2: number; partial: boolean }> | null;
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

type ParsedArgs = { ok: true; options: Options } | { ok: false; message: string; exitCode: number };

function parseArgs(args: string[]): ParsedArgs {
  let bands: Record<string, WavelengthBand> = { ...DEFAULT_BANDS };
  let unit: string | undefined;
  const files: string[] = [];
  let optionsEnded = false;
  for (let i = 0; i < args.length; i++) {
    const arg = args[i];
    if (optionsEnded || !arg.startsWith('--')) {
      files.push(arg);
      continue;
    }
    if (arg === '--') {
      optionsEnded = true;
      continue;
    }
    if (arg === '--help') return { ok: false, message: '', exitCode: 0 };
    const eq = arg.indexOf('=');
    const name = eq === -1 ? arg : arg.slice(0, eq);
    if (name !== '--bands' && name !== '--unit') return { ok: false, message: `unknown option ${arg}`, exitCode: 2 };
    const value = eq === -1 ? args[++i] : arg.slice(eq + 1);
    if (value === undefined) return { ok: false, message: `${name} needs a value`, exitCode: 2 };
    if (name === '--unit') {
      if (parseSpectralUnit(value) === null) {
        return { ok: false, message: `unknown unit "${value}"; use a spectral irradiance unit such as ${KNOWN_UNITS_HINT}`, exitCode: 2 };
      }
      unit = value;
    } else {
      const parsed = parseBandList(value);
      if (!parsed.ok) return { ok: false, message: `--bands: ${parsed.message}`, exitCode: 2 };
      bands = parsed.bands;
    }
  }
  if (files.length === 0) return { ok: false, message: 'no file given', exitCode: 2 };
  return { ok: true, options: { bands, unit, files } };
}

function failed(file: string, issues: ImportIssue[], unit: string | null = null): FileReport {
  return { file, ok: false, unit, samples: 0, rangeNm: null, bands: null, totalWm2: null, peakNm: null, photonFluxUmolM2S: null, issues };
}

async function readBytes(file: string): Promise<Uint8Array | ImportIssue> {
  try {
    const info = await stat(file);
    if (!info.isFile()) return { line: null, code: 'file_unreadable', severity: 'error', message: `${file} is not a file.` };
    if (info.size > MAX_FILE_BYTES) {
      return { line: null, code: 'file_too_large', severity: 'error', message: `${file} is larger than ${MAX_FILE_BYTES / 1024 / 1024} MB; it is not a single spectrum.` };
    }
    return await readFile(file);
  } catch (err) {
    const reason = (err as NodeJS.ErrnoException).code === 'ENOENT' ? 'does not exist' : 'cannot be read';
    return { line: null, code: 'file_unreadable', severity: 'error', message: `${file} ${reason}.` };
  }
}

async function reportFile(file: string, options: Options): Promise<FileReport> {
  const bytes = await readBytes(file);
  if (!(bytes instanceof Uint8Array)) return failed(file, [bytes]);
  const decoded = decodeTextBytes(bytes);
  const result = importSpectrum(decoded.text, { unit: options.unit });
  const issues = [...decoded.issues, ...result.issues];
  if (!result.ok || result.spectrum === null) return failed(file, issues, result.unit);
  const summary = summariseSpectrum(result.spectrum, options.bands);
  const bands: FileReport['bands'] = {};
  for (const [name, b] of Object.entries(summary.bands)) bands[name] = { loNm: b.loNm, hiNm: b.hiNm, wm2: b.wm2, partial: b.partial };
  return {
    file,
    ok: true,
    unit: result.unit,
    samples: summary.samples,
    rangeNm: summary.rangeNm,
    bands,
    totalWm2: summary.totalWm2,
    peakNm: summary.peakNm,
    photonFluxUmolM2S: summary.photonFluxUmolM2S,
    issues,
  };
}

export async function runSpectrumCommand(args: string[]): Promise<number> {
  const parsed = parseArgs(args);
  if (!parsed.ok) {
    if (parsed.exitCode === 0) {
      process.stdout.write(SPECTRUM_USAGE);
      return 0;
    }
    process.stderr.write(`analyze spectrum: ${parsed.message}\n${SPECTRUM_USAGE}`);
    return parsed.exitCode;
  }
  const files: FileReport[] = [];
  for (const file of parsed.options.files) files.push(await reportFile(file, parsed.options));
  process.stdout.write(`${JSON.stringify({ files }, null, 2)}\n`);
  return files.every((f) => f.ok) ? 0 : 1;
}
