/**
 * One check pipeline wherever a file is read: the same fixture through the bench CLI's command
 * function, the File check page's function and the shared pipeline gives the same figures.
 * The figures themselves are checked against outside references in the CLI's and the
 * measurement core's own tests; this proves the three readers cannot drift apart.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { runGridCommand } from '#scripts/analyze/grid-command.ts';
import { runSpectrumCommand } from '#scripts/analyze/spectrum-command.ts';
import { checkMeterReadingsFile } from '#shared/measurement/check/check-meter-readings-file.ts';
import { checkSpectrumFile } from '#shared/measurement/check/check-spectrum-file.ts';
import { checkMeterReadingsOnPage, checkSpectrumOnPage } from '#src/features/file-check/utils/page-checks.ts';

const root = join(import.meta.dirname, '..', '..');
const gridFixture = join(root, 'tests', 'fixtures', 'meter-readings', 'panel-34x80-three-distances.csv');
const spectrumFixture = join(root, 'tests', 'fixtures', 'spectra', 'comma-w-m2-nm.csv');

/** Runs a CLI command function and returns what it printed on stdout, parsed. */
async function cliJson(run: (args: string[]) => Promise<number>, args: string[]) {
  let out = '';
  vi.spyOn(process.stdout, 'write').mockImplementation((chunk) => ((out += String(chunk)), true));
  vi.spyOn(process.stderr, 'write').mockImplementation(() => true);
  const code = await run(args);
  vi.restoreAllMocks();
  return { code, json: JSON.parse(out) };
}

/** Equal to 10 significant digits: the CLI rounds its JSON to that (tidy). */
function same(a: number | null, b: number | null) {
  if (a === null || b === null) return expect(a).toBe(b);
  expect(Math.abs(a - b)).toBeLessThanOrEqual(Math.abs(b) * 1e-9);
}

afterEach(() => vi.restoreAllMocks());

const plain = (v: unknown) => JSON.parse(JSON.stringify(v));

describe('one check pipeline for the CLI, the page and the worker', () => {
  it('a meter grid gives the same figures through all three', async () => {
    const bytes = new Uint8Array(readFileSync(gridFixture));
    const footprint = { widthCm: 34, heightCm: 80 };
    const { code, json } = await cliJson(runGridCommand, ['--footprint', '34x80', gridFixture]);
    expect(code).toBe(0);
    const page = checkMeterReadingsOnPage(bytes, footprint);
    const shared = checkMeterReadingsFile(bytes, { footprint });
    // Everything but the field's lookup function (a closure per call) is plain data.
    expect(plain(page)).toEqual(plain(shared));
    expect(page.planes).toHaveLength(json.planes.length);
    page.planes.forEach((p, i) => {
      const cli = json.planes[i];
      same(p.distanceCm, cli.distanceCm);
      expect(p.analysis.points).toBe(cli.points);
      same(p.analysis.peak, cli.peakMwCm2);
      same(p.analysis.center, cli.centerMwCm2);
      for (const w of p.analysis.spreadWidths) same(w.widthCm, cli.spreadWidthCm[String(w.pct)]);
      expect(p.analysis.widthAtEdge).toEqual(cli.widthAtEdge);
      same(p.analysis.footprint!.minOverMean, cli.footprint.minOverMean);
      same(p.analysis.footprint!.cv, cli.footprint.cv);
    });
    same(page.falloff.exponent, json.falloffExponent);
  });

  it('a spectrum gives the same band figures through all three', async () => {
    const bytes = new Uint8Array(readFileSync(spectrumFixture));
    const { code, json } = await cliJson(runSpectrumCommand, [spectrumFixture]);
    expect(code).toBe(0);
    const page = checkSpectrumOnPage(bytes, '');
    const shared = checkSpectrumFile(bytes);
    expect(page.summary).toEqual(shared.summary);
    const [cli] = json.files;
    for (const name of ['red', 'nir']) same(page.summary!.bands[name].wm2, cli.bands[name].wm2);
    same(page.summary!.totalWm2, cli.totalWm2);
    same(page.summary!.photonFluxUmolM2S, cli.photonFluxUmolM2S);
    expect(page.result!.unit).toBe(cli.unit);
  });

  it('refuses a file over the one size limit the same way everywhere', () => {
    const big = new Uint8Array(5 * 1024 * 1024 + 1);
    for (const check of [checkSpectrumFile(big), checkMeterReadingsFile(big), checkSpectrumOnPage(big, '')]) {
      expect(check.ok).toBe(false);
      expect(check.issues.map((i) => i.code)).toEqual(['file_too_large']);
    }
  });
});
