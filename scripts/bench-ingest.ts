/**
 * Ingest benchmark: `npm run bench:ingest`.
 * Builds 405 spectrum exports in memory with the demo generator's export writer and random
 * source (3 planes × 135 grid points, 1,300 samples each, a few LED lines plus noise), then times
 * the shared check pipeline (decoding, import and analysis: bands, total, peak, photon flux,
 * emission peaks) against a bare csv-parse pass over the same bytes. Prints throughput, peak memory and whether the targets are met; never fails the build.
 */
import { parse } from 'csv-parse/sync';
import { checkSpectrumFile } from '#shared/measurement/check/check-spectrum-file.ts';
import { DEFAULT_BANDS } from '#shared/measurement/spectral/band-list.ts';
import { DEMO_INSTRUMENTS } from '#seeds/demo/catalog.ts';
import { formatSpectrumExport } from '#seeds/demo/export-formats.ts';
import { mulberry32, normalFrom } from '#seeds/demo/prng.ts';

const DISTANCES_CM = [15, 30, 60];
const GRID_X = 15;
const GRID_Y = 9;
const SAMPLES = 1300;
const TARGET_RATIO = 2.0;
const TARGET_TOTAL_S = 3.0;
const ROUNDS = 5;
/** The demo's array spectrometer, whose export carries dark and raw counts beside the irradiance. */
const INSTRUMENT = DEMO_INSTRUMENTS.find((i) => i.format === 'tab-counts-descending')!;

const LINES = [
  { nm: 630, sigma: 9, weight: 0.6 },
  { nm: 660, sigma: 10, weight: 1 },
  { nm: 810, sigma: 14, weight: 0.5 },
  { nm: 850, sigma: 15, weight: 0.8 },
];

/** One export in the demo's tab-separated shape: four LED lines plus noise, W/m²/nm. */
function makeExport(uniform: () => number, gauss: () => number, distanceCm: number, x: number, y: number): string {
  const offCenter = Math.hypot(x - (GRID_X - 1) / 2, y - (GRID_Y - 1) / 2);
  const scale = (40 / (distanceCm + 10)) * Math.exp(-offCenter / 9); // W/m²/nm at the line peaks
  const step = (1050 - 340) / (SAMPLES - 1);
  const wavelengthsNm: number[] = [];
  const spectralWm2nm: number[] = [];
  const darkCounts: number[] = [];
  const rawCounts: number[] = [];
  for (let i = 0; i < SAMPLES; i++) {
    const nm = 340 + i * step;
    let e = 0;
    for (const line of LINES) e += line.weight * Math.exp(-((nm - line.nm) ** 2) / (2 * line.sigma ** 2));
    e = e * scale + 0.01 * scale * gauss();
    const dark = 900 + Math.floor(uniform() * 40);
    wavelengthsNm.push(nm);
    spectralWm2nm.push(e);
    darkCounts.push(dark);
    rawCounts.push(dark + Math.max(0, Math.round(e * 1200)));
  }
  return formatSpectrumExport('tab-counts-descending', {
    instrument: INSTRUMENT,
    wavelengthsNm,
    spectralWm2nm,
    distanceCm,
    xCm: x * 5,
    yCm: y * 5,
    takenAt: '2025-03-04 09:30:00',
    integrationMs: 40 + Math.floor(uniform() * 200),
    darkCounts,
    rawCounts,
  });
}

function buildCorpus(): Uint8Array[] {
  const uniform = mulberry32(20240312);
  const gauss = normalFrom(uniform);
  const encoder = new TextEncoder();
  const files: Uint8Array[] = [];
  for (const d of DISTANCES_CM) for (let x = 0; x < GRID_X; x++) for (let y = 0; y < GRID_Y; y++) files.push(encoder.encode(makeExport(uniform, gauss, d, x, y)));
  return files;
}

/** Lines before the first data row (comment preamble and header), for the csv-parse baseline. */
function preambleLines(file: Uint8Array): number {
  const lines = new TextDecoder().decode(file.subarray(0, 4096)).split('\n');
  return lines.findIndex((l) => /^\d/.test(l));
}

const peak = { rss: 0, heap: 0 };
function sampleMemory(): void {
  const m = process.memoryUsage();
  peak.rss = Math.max(peak.rss, m.rss);
  peak.heap = Math.max(peak.heap, m.heapUsed);
}

function ingest(files: Uint8Array[]): number {
  let checksum = 0;
  for (let i = 0; i < files.length; i++) {
    const bytes = files[i];
    if (i % 25 === 0) sampleMemory();
    const check = checkSpectrumFile(bytes, { bands: DEFAULT_BANDS });
    if (!check.summary) throw new Error(`benchmark export rejected: ${JSON.stringify(check.issues[0])}`);
    checksum += check.summary.bands.red.wm2 ?? 0;
  }
  return checksum;
}

function bareCsvParse(files: Uint8Array[]): number {
  let rows = 0;
  const skip = preambleLines(files[0]);
  for (const bytes of files) {
    const records = parse(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength), {
      delimiter: '\t',
      // csv-parse at its fastest: told where the table starts (the importer must find that
      // itself) and which record delimiters to expect. With relax_column_count over the
      // preamble instead, csv-parse 7 slows about 40-fold, which would flatter the ratio.
      from_line: skip + 1,
      record_delimiter: ['\r\n', '\n'],
      skip_empty_lines: true,
    }) as string[][];
    rows += records.length;
  }
  return rows;
}

function timeSeconds(fn: () => unknown): number {
  const start = process.hrtime.bigint();
  fn();
  return Number(process.hrtime.bigint() - start) / 1e9;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function main(): void {
  const wallStart = process.hrtime.bigint();
  const files = buildCorpus();
  const megabytes = files.reduce((sum, f) => sum + f.byteLength, 0) / 1e6;
  const buildS = Number(process.hrtime.bigint() - wallStart) / 1e9;

  // Warm both paths up so the comparison is not a comparison of JIT start-up.
  ingest(files.slice(0, 20));
  bareCsvParse(files.slice(0, 20));

  // Rounds alternate the two passes and the ratio is taken round by round, so a busy moment
  // on a shared machine slows both sides of a comparison rather than one.
  const ingestTimes: number[] = [];
  const csvTimes: number[] = [];
  const ratios: number[] = [];
  for (let round = 0; round < ROUNDS; round++) {
    ingestTimes.push(timeSeconds(() => ingest(files)));
    csvTimes.push(timeSeconds(() => bareCsvParse(files)));
    ratios.push(ingestTimes[round] / csvTimes[round]);
  }
  sampleMemory();
  const ingestS = median(ingestTimes);
  const csvS = median(csvTimes);
  const ratio = median(ratios);
  const firstPassS = ingestTimes[0];
  const processPeakRssMb = process.resourceUsage().maxRSS / 1024;
  const totalS = Number(process.hrtime.bigint() - wallStart) / 1e9;

  const line = (label: string, value: string) => console.log(`${label.padEnd(34)}${value}`);
  console.log(`Benchlight ingest benchmark (Node ${process.version}, ${ROUNDS} rounds, median)`);
  line('spectra', `${files.length} × ${SAMPLES} samples, ${megabytes.toFixed(1)} MB`);
  line('corpus generation', `${buildS.toFixed(2)} s`);
  line('import + analysis', `${ingestS.toFixed(3)} s (first round ${firstPassS.toFixed(3)} s)`);
  line('throughput', `${(files.length / ingestS).toFixed(0)} spectra/s, ${(megabytes / ingestS).toFixed(1)} MB/s`);
  line('bare csv-parse pass (median)', `${csvS.toFixed(3)} s (${(megabytes / csvS).toFixed(1)} MB/s)`);
  line(
    'ratio to csv-parse',
    `${ratio.toFixed(2)} (rounds ${Math.min(...ratios).toFixed(2)}–${Math.max(...ratios).toFixed(2)}; target ≤ ${TARGET_RATIO.toFixed(1)}) ${ratio <= TARGET_RATIO ? 'met' : 'NOT met'}`,
  );
  line('peak memory during import', `RSS ${(peak.rss / 1e6).toFixed(0)} MB, heap used ${(peak.heap / 1e6).toFixed(0)} MB`);
  line('peak RSS of the whole process', `${processPeakRssMb.toFixed(0)} MB (includes the csv-parse pass)`);
  line('total time (whole script)', `${totalS.toFixed(2)} s`);
  line('import + analysis, all 405', `${firstPassS.toFixed(2)} s (target < ${TARGET_TOTAL_S} s) ${firstPassS < TARGET_TOTAL_S ? 'met' : 'NOT met'}`);
}

main();
