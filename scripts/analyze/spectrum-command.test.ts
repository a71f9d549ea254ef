import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));
const fixture = (name: string) => `tests/fixtures/spectra/${name}`;

interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

function analyze(...args: string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(process.execPath, ['--import', 'tsx', 'scripts/analyze.ts', 'spectrum', ...args], { cwd: root }, (error, stdout, stderr) => {
      resolve({ code: error ? Number((error as { code?: number }).code ?? 1) : 0, stdout, stderr });
    });
  });
}

// Expected band values: the fixtures' base spectrum E = (λ − 500)/10000 W·m⁻²·nm⁻¹ on 590–810 nm is
// linear in λ, so the trapezoid rule is exact (computed by hand: red 1.5, nir overlap 2.805, total 4.4 W/m²).
describe('analyze.ts spectrum', { timeout: 30000 }, () => {
  it('prints one JSON document and exits 0 when every file is usable', async () => {
    const run = await analyze(fixture('utf8-bom-crlf.csv'), fixture('semicolon-decimal-comma.csv'));
    expect(run.code).toBe(0);
    const { files } = JSON.parse(run.stdout);
    expect(files).toHaveLength(2);
    const [first] = files;
    expect(Object.keys(first)).toEqual(['file', 'ok', 'unit', 'samples', 'rangeNm', 'bands', 'totalWm2', 'peakNm', 'photonFluxUmolM2S', 'issues']);
    expect(first).toMatchObject({ file: fixture('utf8-bom-crlf.csv'), ok: true, unit: 'uW/cm2/nm', samples: 23, rangeNm: [590, 810], peakNm: 810, issues: [] });
    expect(first.bands.red).toMatchObject({ loNm: 600, hiNm: 700, partial: false });
    expect(first.bands.red.wm2).toBeCloseTo(1.5, 12);
    expect(first.bands.nir).toMatchObject({ loNm: 700, hiNm: 1100, partial: true });
    expect(first.bands.nir.wm2).toBeCloseTo(2.805, 12);
    expect(first.totalWm2).toBeCloseTo(4.4, 12);
    // Computed from exact 2019 SI constants: ∫(λ−500)λ/10000 dλ over 590–810 nm = 2964.13… / 119.6265656,
    // plus the trapezoid's exact error on the quadratic E·λ, (b − a)·h²·g''/12 = 220·10²·(2/10000)/12
    // (Euler–Maclaurin formula)
    const moment = ((810 ** 3 - 590 ** 3) / 3 - 250 * (810 ** 2 - 590 ** 2)) / 10000;
    expect(first.photonFluxUmolM2S).toBeCloseTo((moment + (220 * 100 * (2 / 10000)) / 12) / (6.62607015e-34 * 299792458 * 6.02214076e23 * 1e3), 7); // the CLI prints 10 significant digits
    expect(files[1].unit).toBe('mW/m2/nm');
  });

  it('exits 1 when a file is not usable, still reporting every file', async () => {
    const run = await analyze(fixture('comma-w-m2-nm.csv'), fixture('no-unit.csv'), fixture('does-not-exist.csv'));
    expect(run.code).toBe(1);
    const { files } = JSON.parse(run.stdout);
    expect(files.map((f: { ok: boolean }) => f.ok)).toEqual([true, false, false]);
    expect(files[1].issues[0]).toMatchObject({ line: null, code: 'no_unit', severity: 'error' });
    expect(files[1].issues[0].message).toMatch(/--unit/);
    expect(files[2]).toMatchObject({ ok: false, unit: null, samples: 0, rangeNm: null, bands: null, totalWm2: null });
    expect(files[2].issues[0].code).toBe('file_unreadable');
  });

  it('takes --unit in any spelling and --bands=… replacing the defaults', async () => {
    const run = await analyze('--unit', 'µW/cm²/nm', '--bands=deep red=650-700,edge=800-900', fixture('no-unit.csv'));
    expect(run.code).toBe(0);
    const [file] = JSON.parse(run.stdout).files;
    expect(file.unit).toBe('uW/cm2/nm');
    expect(Object.keys(file.bands)).toEqual(['deep red', 'edge']);
    // no-unit.csv holds the W/m2/nm numbers; read as µW/cm²/nm they are 100× smaller: ∫650–700 = 0.875/100
    expect(file.bands['deep red'].wm2).toBeCloseTo(0.00875, 12);
    expect(file.bands.edge).toMatchObject({ partial: true });
  });

  it('prints wm2: null, not 0, for a band the file does not reach, with a band_not_measured issue', async () => {
    // The fixture covers 590–810 nm: nothing of 300–400 nm was measured, which is unknown, not "no
    // emission" (definition); 600–700 nm lies inside and keeps its hand-computed 1.5 W/m².
    const run = await analyze('--bands', 'uv=300-400,red=600-700', fixture('utf8-bom-crlf.csv'));
    expect(run.code).toBe(0);
    const [file] = JSON.parse(run.stdout).files;
    expect(file.bands.uv).toEqual({ loNm: 300, hiNm: 400, wm2: null, partial: true });
    expect(file.bands.red.wm2).toBeCloseTo(1.5, 12);
    expect(file.issues.map((i: { code: string; severity: string }) => [i.code, i.severity])).toEqual([['band_not_measured', 'warning']]);
    expect(file.issues[0].message).toMatch(/"uv".*590–810 nm.*not measured/);
  });

  it('decodes UTF-16 files from their bytes and reports located issues with lines', async () => {
    const run = await analyze(fixture('utf16le-bom.csv'), fixture('out-of-range-rows.csv'));
    expect(run.code).toBe(0);
    const [utf16, outOfRange] = JSON.parse(run.stdout).files;
    expect(utf16).toMatchObject({ ok: true, unit: 'uW/cm2/nm', samples: 23 });
    expect(outOfRange.issues.map((i: { code: string; line: number }) => [i.code, i.line])).toEqual([
      ['wavelength_out_of_range', 2],
      ['wavelength_out_of_range', 26],
    ]);
  });

  it.each([
    [['--unit', 'furlongs', fixture('comma-w-m2-nm.csv')], /unknown unit "furlongs"/],
    [['--bands', 'red=700-600', fixture('comma-w-m2-nm.csv')], /--bands/],
    [['--colour', fixture('comma-w-m2-nm.csv')], /unknown option '--colour'/i],
    [[], /no file given/],
  ])('exits 2 with a message on a bad command line: %j', async (args, message) => {
    const run = await analyze(...args);
    expect(run.code).toBe(2);
    expect(run.stdout).toBe('');
    expect(run.stderr).toMatch(message);
    expect(run.stderr).toMatch(/usage:/);
  });
});
