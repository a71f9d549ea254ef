import { execFile } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildDemoScenario } from '#seeds/demo/scenario.ts';
import { checkMeterReadingsFile } from '#shared/measurement/check/check-meter-readings-file.ts';
import { planSession } from '#shared/measurement/planner/plan-session.ts';
import { initialForm, readForm, withPlanes } from '#src/features/planner/utils/planner-form.ts';
import { planReport } from './plan-command.ts';

const root = join(import.meta.dirname, '..', '..');
const run = promisify(execFile);
const timeout = 30_000;

/** Spawns the CLI as a tester would; never throws on a non-zero exit. */
async function plan(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await run(process.execPath, ['--import', 'tsx', 'scripts/analyze.ts', 'plan', ...args], { cwd: root });
    return { code: 0, stdout, stderr };
  } catch (err) {
    const e = err as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

/** The demo generator's meter files, written to a fresh folder as `make-demo-data.ts` writes them. */
let folder: string;
let meterFiles: string[];
beforeAll(() => {
  folder = mkdtempSync(join(tmpdir(), 'benchlight-plan-'));
  meterFiles = [];
  for (const f of buildDemoScenario().files.filter((f) => f.path.startsWith('meter/'))) {
    const path = join(folder, f.path);
    mkdirSync(dirname(path), { recursive: true });
    writeFileSync(path, f.text, 'utf8');
    meterFiles.push(path);
  }
});
afterAll(() => rmSync(folder, { recursive: true, force: true }));

/** Centre readings per distance, read here without the importer (the template is plain commas). */
function centreReadings(path: string): Map<number, number> {
  const out = new Map<number, number>();
  for (const line of readFileSync(path, 'utf8').split('\n')) {
    const [d, x, y, e] = line.split(',').map(Number);
    if (x === 0 && y === 0 && Number.isFinite(e)) out.set(d, e);
  }
  return out;
}

const PLAN_KEYS = ['strategy', 'distanceCm', 'interpolated', 'positions', 'units', 'totalMinutes', 'coveredShare', 'outsideGridShare', 'doseJCm2', 'overCapShare'];

describe('plan CLI on the demo meter files', () => {
  it('single: at least one plan per measured distance; at the centre t = 1000·H* / E_centre', { timeout: 60_000 }, async () => {
    for (const file of meterFiles) {
      const { code, stdout } = await plan('--dose', '10', '--target', '2x2', '--cover', '1', '--strategy', 'single', file);
      expect(code).toBe(0);
      const { plans } = JSON.parse(stdout);
      const centres = centreReadings(file);
      expect([...centres.keys()]).toEqual([15, 30, 60]);
      for (const [d, e] of centres) {
        const p = plans.find((q: { distanceCm: number }) => q.distanceCm === d);
        expect(p.interpolated).toBe(false);
        // H = E·t (ISO 80000-7): 10 J/cm² at E mW/cm² takes 10 000 / E seconds.
        expect(p.totalMinutes * 60).toBeCloseTo(10000 / e, 5);
      }
    }
  });

  it('prints the documented keys, ranked by total minutes, every strategy', { timeout }, async () => {
    const { code, stdout } = await plan('--dose', '10', '--target', '40x30', meterFiles[0]);
    expect(code).toBe(0);
    const { plans } = JSON.parse(stdout);
    for (const p of plans) {
      expect(Object.keys(p)).toEqual(PLAN_KEYS);
      expect(Object.keys(p.doseJCm2)).toEqual(['min', 'mean', 'max']);
      expect(p.coveredShare).toBeGreaterThanOrEqual(0.9);
      expect(p.interpolated).toBe(![15, 30, 60].includes(p.distanceCm));
      if (p.strategy !== 'placements') expect(p.positions.every((q: { minutes: number }) => q.minutes === p.totalMinutes)).toBe(true);
    }
    const totals = plans.map((p: { totalMinutes: number }) => p.totalMinutes);
    expect(totals).toEqual([...totals].sort((a, b) => a - b));
    expect(new Set(plans.map((p: { strategy: string }) => p.strategy))).toEqual(new Set(['single', 'placements', 'units']));
  });

  it('agrees with the page: chest + abdomen, medium body, 10 J/cm², 90 %', { timeout }, async () => {
    // The page's own defaults, turned into a planner input by the page's own form code.
    const pageInput = readForm(initialForm()).input!;
    const file = meterFiles[0];
    const check = checkMeterReadingsFile(readFileSync(file));
    const planes = check.planes.map((p) => ({ distanceCm: p.distanceCm, points: p.points }));
    const page = planSession({ ...withPlanes(pageInput, planes, null)!, strategies: ['single'] });

    const { code, stdout } = await plan('--dose', '10', '--zones', 'chest+abdomen', '--body', 'medium', '--strategy', 'single', file);
    expect(code).toBe(0);
    expect(JSON.parse(stdout).plans).toEqual(page.plans.map(planReport));
    expect(page.plans.length).toBeGreaterThanOrEqual(3);
  });
});

describe('plan CLI refuses what it cannot use', () => {
  it('a target whose sides are not multiples of 2 cm, or no dose: exit 2 with usage', { timeout }, async () => {
    // Exit status 2 for a usage error, as grep and diff do (common practice, no source).
    const odd = await plan('--dose', '10', '--target', '41x30', meterFiles[0]);
    expect(odd.code).toBe(2);
    expect(odd.stderr).toMatch(/multiples of 2 cm/);
    expect(odd.stdout).toBe('');
    const noDose = await plan('--target', '40x30', meterFiles[0]);
    expect(noDose.code).toBe(2);
    expect(noDose.stderr).toMatch(/usage:/);
  });

  it.each([
    [['--dose', '10', '--target', '40x30', '--cover', '1.5']],
    [['--dose', '10', '--target', '40x30', '--strategy', 'both']],
    [['--dose', '10', '--target', '40x30', '--dose-cap', '0.5']],
    [['--dose', '10', '--zones', 'chest+elbow']],
    [['--dose', 'ten', '--target', '40x30']],
    [['--dose', '10', '--target', '40x30', '--colour', 'red']],
  ])('%j: exit 2', { timeout }, async (args) => {
    const { code, stdout } = await plan(...args, meterFiles[0]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
  });

  it('a missing or unusable file: exit 1', { timeout }, async () => {
    const missing = await plan('--dose', '10', '--target', '40x30', join(folder, 'no-such-file.csv'));
    expect(missing.code).toBe(1);
    expect(missing.stderr).toMatch(/does not exist/);
    const malformed = await plan('--dose', '10', '--target', '40x30', 'tests/fixtures/meter-readings/malformed.csv');
    expect(malformed.code).toBe(1);
    expect(malformed.stderr).toMatch(/cannot be used/);
  });

  it('names on stderr the plans that cannot be made', { timeout }, async () => {
    // The demo body panel's grid spans 200 cm across (x −100 to 100 cm): a 300 cm wide target leaves
    // a third outside it (hand count: 50 of 150 columns of 2 cm), so no plan reaches 90 %.
    const { code, stdout, stderr } = await plan('--dose', '10', '--target', '300x10', '--strategy', 'single', meterFiles[0]);
    expect(code).toBe(0);
    expect(JSON.parse(stdout).plans).toEqual([]);
    expect(stderr).toMatch(/no single plan at 15 cm: only 66\.7 % of the target lies within the measured grid/);
  });
});
