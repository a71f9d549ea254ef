import { execFile } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { linearRegression, mean, min, max, standardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { panelViewFactor } from '#shared/measurement/geometry/view-factor.ts';

const root = join(import.meta.dirname, '..', '..');
const fixture = (name: string) => join('tests', 'fixtures', 'meter-readings', name);
const run = promisify(execFile);

/** Spawns the CLI as a tester would; never throws on a non-zero exit. */
async function grid(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await run(process.execPath, ['--import', 'tsx', 'scripts/analyze.ts', 'grid', ...args], {
      cwd: root,
    });
    return { code: 0, stdout, stderr };
  } catch (err) {
    const e = err as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

/** Readings of a fixture, parsed here independently of the importer (plain comma files only). */
function fixtureRows(name: string): { d: number; x: number; y: number; e: number }[] {
  return readFileSync(join(root, fixture(name)), 'utf8')
    .split('\n')
    .filter((l) => /^[\d.-]/.test(l))
    .map((l) => l.split(',').map(Number))
    .map(([d, x, y, e]) => ({ d, x, y, e }));
}

// Every key keeps its meaning across versions; new figures come as new keys. `footprintArea` (the
// area-weighted uniformity from the interpolated map) was added beside `footprint` (readings only).
const PLANE_KEYS = ['centerMwCm2', 'distanceCm', 'footprint', 'footprintArea', 'peakMwCm2', 'points', 'spreadWidthCm', 'widthAtEdge'];
const AREA_KEYS = ['coveredShare', 'cv', 'edgesWithoutReading', 'issues', 'minOverMax', 'minOverMean', 'nonUniformityPct'];
const timeout = 30_000;

describe('grid CLI on model-generated fixtures', () => {
  it('34 × 80 cm panel at 15 cm: widths, centre and footprint uniformity', { timeout }, async () => {
    const { code, stdout, stderr } = await grid('--footprint', '34x80', fixture('panel-34x80-15cm.csv'));
    expect(code).toBe(0);
    expect(stderr).toMatch(/\(plane at 15 cm\): warning footprint_edge_unmeasured/);
    const report = JSON.parse(stdout);
    expect(report.planes).toHaveLength(1);
    const [plane] = report.planes;
    expect(Object.keys(plane).sort()).toEqual(PLANE_KEYS);
    expect(Object.keys(plane.spreadWidthCm).sort()).toEqual(['25', '50', '80']);
    expect(Object.keys(plane.footprint).sort()).toEqual(['cv', 'minOverMax', 'minOverMean', 'nonUniformityPct']);
    expect(plane.distanceCm).toBe(15);
    expect(plane.points).toBe(41 * 11);
    expect(plane.peakMwCm2).toBe(60);
    expect(plane.centerMwCm2).toBe(60);
    // Results of the view-factor model (Howell B-3, computed): a 34 × 80 cm Lambertian emitting area
    // at 15 cm has 50 % and 25 % spread widths of about 39 and 54 cm (50 % near the emitters' edge,
    // 25 % a few cm beyond).
    expect(Math.abs(plane.spreadWidthCm['50'] - 39)).toBeLessThan(1);
    expect(Math.abs(plane.spreadWidthCm['25'] - 54)).toBeLessThan(1);
    expect(plane.widthAtEdge).toEqual([]);
    expect(report.falloffExponent).toBeNull();

    // Footprint figures keep their meaning, the readings inside the area: cross-checked with
    // simple-statistics on the file's own readings (U₀ per EN 12464-1; population σ; non-uniformity
    // as IEC 60904-9 defines it).
    const inside = fixtureRows('panel-34x80-15cm.csv')
      .filter((r) => Math.abs(r.x) <= 17 && Math.abs(r.y) <= 40)
      .map((r) => r.e);
    expect(plane.footprint.minOverMean).toBeCloseTo(min(inside) / mean(inside), 8);
    expect(plane.footprint.minOverMax).toBeCloseTo(min(inside) / max(inside), 8);
    expect(plane.footprint.cv).toBeCloseTo(standardDeviation(inside) / mean(inside), 8);
    expect(plane.footprint.nonUniformityPct).toBeCloseTo((100 * (max(inside) - min(inside))) / (max(inside) + min(inside)), 6);

    // footprintArea: over the whole 34 × 80 cm area from the interpolated map, area-weighted. Dense
    // reference (computed from Howell B-3, mean checked against the C-11 closed form in
    // footprint-area.test.ts): U₀ = 0.4036, CV = 0.2051. The file's 2 × 10 cm grid gives 0.456 from
    // its readings alone, the map 0.408.
    expect(Object.keys(plane.footprintArea).sort()).toEqual(AREA_KEYS);
    expect(Math.abs(plane.footprintArea.minOverMean - 0.4036)).toBeLessThan(0.005);
    expect(Math.abs(plane.footprintArea.cv - 0.2051)).toBeLessThan(0.006);
    expect(plane.footprint.minOverMean).toBeGreaterThan(0.45);
    expect(plane.footprintArea.coveredShare).toBe(1);
    // Its columns sit at x = ±16 and ±18: none on the edges x = ±17, so the CLI warns.
    expect(plane.footprintArea.edgesWithoutReading).toEqual(['left', 'right']);
    expect(plane.footprintArea.issues.map((i: { code: string }) => i.code)).toEqual(['footprint_edge_unmeasured']);
  });

  it('three distances: planes sorted, falloff exponent = least-squares slope of the model centres', { timeout }, async () => {
    const { code, stdout } = await grid(fixture('panel-34x80-three-distances.csv'));
    expect(code).toBe(0);
    const report = JSON.parse(stdout);
    expect(report.planes.map((p: { distanceCm: number }) => p.distanceCm)).toEqual([15, 30, 60]);
    for (const p of report.planes) {
      expect(p.footprint).toBeNull();
      expect(p.footprintArea).toBeNull();
    }
    // Reference: centres from the B-3 configuration factor (Howell), regressed with simple-statistics.
    const panel = { widthCm: 34, heightCm: 80 };
    const pairs = [15, 30, 60].map((d) => [Math.log(d), Math.log(panelViewFactor(panel, { xCm: 0, yCm: 0, distanceCm: d }))]);
    expect(report.falloffExponent).toBeCloseTo(-linearRegression(pairs).m, 4);
    // Widths grow with distance: the light spreads (common practice, no source).
    const w50 = report.planes.map((p: { spreadWidthCm: Record<string, number> }) => p.spreadWidthCm['50']);
    expect(w50[0]).toBeLessThan(w50[1]);
    expect(w50[1]).toBeLessThan(w50[2]);
  });
});

describe('grid CLI on hand-written fixtures', () => {
  it('60, 50 and 28 mW/cm² at 15, 30 and 61 cm give a falloff exponent near 0.55', { timeout }, async () => {
    const { code, stdout } = await grid(fixture('falloff-60-50-28.csv'));
    expect(code).toBe(0);
    const report = JSON.parse(stdout);
    expect(report.planes.map((p: { centerMwCm2: number }) => p.centerMwCm2)).toEqual([60, 50, 28]);
    // Common practice, no source: these centre readings fall off with an exponent near 0.55.
    expect(Math.abs(report.falloffExponent - 0.55)).toBeLessThan(0.02);
    // Cross-check: ordinary least squares of ln E on ln d by simple-statistics.
    const pairs = [[15, 60], [30, 50], [61, 28]].map(([d, e]) => [Math.log(d), Math.log(e)]);
    expect(report.falloffExponent).toBeCloseTo(-linearRegression(pairs).m, 8);
  });

  it('rows off the centre line, uneven spacing, no centre point: hand-computed widths', { timeout }, async () => {
    const { code, stdout } = await grid('--footprint=34X80', fixture('off-centre-rows.csv'));
    expect(code).toBe(0);
    const [plane] = JSON.parse(stdout).planes;
    expect(plane.centerMwCm2).toBeNull();
    expect(plane.peakMwCm2).toBe(52);
    // Hand-computed on the y = 2.5 row (it holds the peak): 80 % = 41.6 → ends −7.0286 and 11.3692;
    // 50 % = 26 → −13.7778 and 19.5; 25 % = 13 → −19.5556 and 27.2222.
    expect(plane.spreadWidthCm['80']).toBeCloseTo(18.3978022, 6);
    expect(plane.spreadWidthCm['50']).toBeCloseTo(33.2777778, 6);
    expect(plane.spreadWidthCm['25']).toBeCloseTo(46.7777778, 6);
    expect(plane.widthAtEdge).toEqual([]);
    // Footprint: 6 columns × 3 rows inside; min 18 (0.6 × 30), max 52 (hand-computed).
    expect(plane.footprint.minOverMax).toBeCloseTo(18 / 52, 8);
  });

  it('importer warnings go to stderr with their lines and into "issues"; the output stands', { timeout }, async () => {
    const { code, stdout, stderr } = await grid(fixture('single-row-with-warnings.csv'));
    expect(code).toBe(0);
    expect(stderr).toMatch(/single-row-with-warnings\.csv:4: warning/);
    expect(stderr).toMatch(/single-row-with-warnings\.csv:8: warning duplicate_point/);
    const report = JSON.parse(stdout);
    expect(report.issues.map((i: { line: number }) => i.line)).toEqual([4, 8]);
    // Hand-computed on 10/30/50/30/10 at 4 cm steps: widths 4, 10 and 15 cm.
    expect(report.planes[0].spreadWidthCm).toEqual({ '80': 4, '50': 10, '25': 15 });
  });

  it('semicolons, decimal commas, BOM and CRLF; footprint with ×', { timeout }, async () => {
    const { code, stdout } = await grid('--footprint', '34×80', fixture('semicolon-decimal-comma.csv'));
    expect(code).toBe(0);
    const [plane] = JSON.parse(stdout).planes;
    expect(plane.peakMwCm2).toBe(45.5);
    expect(plane.points).toBe(9);
    // 25 % and 50 % reach the ends of the 10 cm row (every reading ≥ 22.75): listed at the edge.
    expect(plane.widthAtEdge).toEqual([50, 25]);
    expect(plane.footprint.minOverMax).toBeCloseTo(20.5 / 45.5, 8);
  });
});

describe('grid CLI refuses what it cannot use', () => {
  it('a file that is not a readings table: exit 1, the importer issue on stderr', { timeout }, async () => {
    // Non-zero exit on a file that cannot be used (common practice, no source).
    const { code, stdout, stderr } = await grid(fixture('malformed.csv'));
    expect(code).toBe(1);
    expect(stdout).toBe('');
    expect(stderr).toMatch(/malformed\.csv: error no_header/);
    expect(stderr).toMatch(/cannot be used/);
  });

  it('a missing column: exit 1 with the header line', { timeout }, async () => {
    const { code, stderr } = await grid(fixture('missing-y-column.csv'));
    expect(code).toBe(1);
    expect(stderr).toMatch(/missing-y-column\.csv:1: error missing_column/);
  });

  it('a missing file: exit 1', { timeout }, async () => {
    const { code, stderr } = await grid(fixture('no-such-file.csv'));
    expect(code).toBe(1);
    expect(stderr).toMatch(/does not exist/);
  });

  it('a malformed --footprint or no file: exit 2 with usage', { timeout }, async () => {
    // Exit status 2 for a usage error, as grep and diff do (common practice, no source).
    const bad = await grid('--footprint', '34', fixture('falloff-60-50-28.csv'));
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/--footprint "34"/);
    const none = await grid();
    expect(none.code).toBe(2);
    expect(none.stderr).toMatch(/usage:/);
  });
});
