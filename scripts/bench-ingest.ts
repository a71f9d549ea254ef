/**
 * Ingest benchmark: `npm run bench:ingest`.
 * Builds 405 spectrum exports in memory (3 planes × 135 grid points, 1,300 samples each, a few
 * LED lines plus noise, from a seeded generator), then times decoding + import + analysis
 * (bands, total, peak, photon flux, emission peaks) against a bare csv-parse pass over the same
 * bytes. Prints throughput, peak memory and whether the targets are met; never fails the build.
 */
import { parse } from 'csv-parse/sync';
import { decodeTextBytes } from '#shared/measurement/import/decode-text.ts';
import { importSpectrum } from '#shared/measurement/import/spectrum-import.ts';
import { DEFAULT_BANDS } from '#shared/measurement/spectral/band-list.ts';
import { summariseSpectrum } from '#shared/measurement/spectral/spectrum-summary.ts';

const DISTANCES_CM = [15, 30, 60];
const GRID_X = 15;
const GRID_Y = 9;
const SAMPLES = 1300;
const TARGET_RATIO = 2.0;
const TARGET_TOTAL_S = 3.0;
const ROUNDS = 5;
/** Metadata lines and the blank line before each export's header (see makeExport). */
const PREAMBLE_LINES = 6;

/** mulberry32: small seeded generator, so every run builds the same files. */
function seeded(seed: number): () => number {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const LINES = [
  { nm: 630, sigma: 9, weight: 0.6 },
  { nm: 660, sigma: 10, weight: 1 },
  { nm: 810, sigma: 14, weight: 0.5 },
  { nm: 850, sigma: 15, weight: 0.8 },
];

function makeExport(random: () => number, distanceCm: number, x: number, y: number, serial: number): string {
  const offCentre = Math.hypot(x - (GRID_X - 1) / 2, y - (GRID_Y - 1) / 2);
  const scale = (4000 / (distanceCm + 10)) * Math.exp(-offCentre / 9); // µW/cm²/nm at the line peaks
  const out: string[] = [
    `Instrument\tDS-1 demo array spectroradiometer`,
    `Serial\tDS1-${String(serial).padStart(6, '0')}`,
    `Integration time (ms)\t${40 + Math.floor(random() * 200)}`,
    `Distance (cm)\t${distanceCm}`,
    `Position (cm)\t${x * 5};${y * 5}`,
    '',
    'Wavelength (nm)\tDark counts\tRaw counts\tIrradiance (uW/cm2/nm)',
  ];
  const step = (1050 - 340) / (SAMPLES - 1);
  for (let i = 0; i < SAMPLES; i++) {
    const nm = 340 + i * step;
    let e = 0;
    for (const line of LINES) e += line.weight * Math.exp(-((nm - line.nm) ** 2) / (2 * line.sigma ** 2));
    e = e * scale + (random() - 0.5) * 0.02 * scale;
    const dark = 900 + Math.floor(random() * 40);
    out.push(`${nm.toFixed(3)}\t${dark}\t${dark + Math.max(0, Math.round(e * 12))}\t${e.toFixed(5)}`);
  }
  return `${out.join('\r\n')}\r\n`;
}

function buildCorpus(): Uint8Array[] {
  const random = seeded(20240312);
  const encoder = new TextEncoder();
  const files: Uint8Array[] = [];
  let serial = 0;
  for (const d of DISTANCES_CM) for (let x = 0; x < GRID_X; x++) for (let y = 0; y < GRID_Y; y++) files.push(encoder.encode(makeExport(random, d, x, y, ++serial)));
  return files;
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
    const result = importSpectrum(decodeTextBytes(bytes).text);
    if (!result.ok || !result.spectrum) throw new Error(`benchmark export rejected: ${JSON.stringify(result.issues[0])}`);
    checksum += summariseSpectrum(result.spectrum, DEFAULT_BANDS).bands.red.wm2;
  }
  return checksum;
}

function bareCsvParse(files: Uint8Array[]): number {
  let rows = 0;
  for (const bytes of files) {
    const records = parse(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength), {
      delimiter: '\t',
      // csv-parse at its fastest: told where the table starts (the importer must find that
      // itself) and which record delimiters to expect. With relax_column_count over the
      // preamble instead, csv-parse 7 slows about 40-fold, which would flatter the ratio.
      from_line: PREAMBLE_LINES + 1,
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
