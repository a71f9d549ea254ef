/**
 * Planner benchmark: `npm run bench:planner`.
 * Reads each demo unit's meter readings (the demo generator's meter files, built in memory and
 * read through the shared check pipeline), then times the session planner one plan at a time:
 * one strategy at one distance, for two targets (chest + abdomen on the medium body outline, and
 * a 40 × 30 cm rectangle), 10 J/cm², 90 % covered, the default caps. Every distance searched
 * (measured ones and every 5 cm between) counts. Prints the figures and whether the targets are
 * met (< 200 ms per one-position or units-side-by-side plan, < 2 s per k-placement plan); never
 * fails the build.
 */
import { cpus } from 'node:os';
import { buildDemoScenario } from '#seeds/demo/scenario.ts';
import { checkMeterReadingsFile } from '#shared/measurement/check/check-meter-readings-file.ts';
import { BODY_SIZE_PRESETS } from '#shared/measurement/planner/body-sizes.ts';
import { searchDistancesCm } from '#shared/measurement/planner/field-at-distance.ts';
import { loadHighsSolver } from '#shared/measurement/planner/highs-solver.ts';
import type { LinearProgram, LpSession, LpSolver } from '#shared/measurement/planner/lp-solver.ts';
import { planSession } from '#shared/measurement/planner/plan-session.ts';
import { DEFAULT_DISTANCE_STEP_CM } from '#shared/measurement/planner/plan-settings.ts';
import type { MeasuredPlane, PlannerTarget, PlanStrategy } from '#shared/measurement/planner/types.ts';

const ROUNDS = 3;
const TARGET_MS: Record<PlanStrategy, number> = { single: 200, units: 200, placements: 2000 };
const TARGETS: { label: string; target: PlannerTarget }[] = [
  { label: 'chest + abdomen, medium body', target: { kind: 'zones', zones: ['chest', 'abdomen'], body: BODY_SIZE_PRESETS.medium } },
  { label: '40 × 30 cm rectangle', target: { kind: 'rectangle', widthCm: 40, heightCm: 30 } },
];
const STRATEGIES: PlanStrategy[] = ['single', 'units', 'placements'];

function nowMs(): number {
  return Number(process.hrtime.bigint()) / 1e6;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

/** Counts the LP solves and the time spent in the solver (building, solving, freeing). */
function countingSolver(solver: LpSolver): LpSolver & { solves: number; ms: number } {
  const counted = {
    name: solver.name,
    solves: 0,
    ms: 0,
    open: (lp: LinearProgram): LpSession => {
      const timed = <T>(fn: () => T): T => {
        const start = nowMs();
        try {
          return fn();
        } finally {
          counted.ms += nowMs() - start;
        }
      };
      const session = timed(() => solver.open(lp));
      return {
        solve: () => {
          counted.solves++;
          return timed(() => session.solve());
        },
        setRowBounds: (row, lower, upper) => timed(() => session.setRowBounds(row, lower, upper)),
        close: () => timed(() => session.close()),
      };
    },
  };
  return counted;
}

function demoUnits(): { id: string; planes: MeasuredPlane[] }[] {
  const { files } = buildDemoScenario();
  return files
    .filter((f) => f.path.startsWith('meter/'))
    .map((f) => {
      const check = checkMeterReadingsFile(new TextEncoder().encode(f.text));
      if (!check.ok) throw new Error(`demo meter file ${f.path} was rejected`);
      return { id: f.path.replace(/^meter\/|-readings\.csv$/g, ''), planes: check.planes.map((p) => ({ distanceCm: p.distanceCm, points: p.points })) };
    });
}

async function main(): Promise<void> {
  const wallStart = nowMs();
  const units = demoUnits();
  const loadStart = nowMs();
  const solver = countingSolver(await loadHighsSolver());
  const loadMs = nowMs() - loadStart;

  const perPlan: Record<PlanStrategy, number[]> = { single: [], units: [], placements: [] };
  const sessions: number[] = [];
  let plans = 0;
  let skipped = 0;
  for (const unit of units) {
    const distances = searchDistancesCm(unit.planes.map((p) => p.distanceCm), DEFAULT_DISTANCE_STEP_CM);
    for (const { target } of TARGETS) {
      const base = { planes: unit.planes, target, doseJCm2: 10, coverShare: 0.9 };
      planSession({ ...base, distancesCm: distances.slice(0, 1) }, solver); // warm-up
      for (const strategy of STRATEGIES) {
        for (const d of distances) {
          const times: number[] = [];
          for (let round = 0; round < ROUNDS; round++) {
            const start = nowMs();
            const result = planSession({ ...base, strategies: [strategy], distancesCm: [d] }, solver);
            times.push(nowMs() - start);
            if (round === 0) {
              plans += result.plans.length;
              skipped += result.skipped.length;
            }
          }
          perPlan[strategy].push(median(times));
        }
      }
      const start = nowMs();
      planSession(base, solver);
      sessions.push(nowMs() - start);
    }
  }
  const solvesBefore = solver.solves;
  const msBefore = solver.ms;
  planSession({ planes: units[0].planes, target: TARGETS[0].target, doseJCm2: 10, coverShare: 0.9, strategies: ['placements'] }, solver);
  const solvesPerSession = solver.solves - solvesBefore;
  const lpMs = solver.ms - msBefore;

  const line = (label: string, value: string) => console.log(`${label.padEnd(46)}${value}`);
  console.log(`Benchlight planner benchmark (Node ${process.version}, ${cpus().length} cores, median of ${ROUNDS} per plan)`);
  line('demo units', `${units.length} (${units.map((u) => u.id).join(', ')})`);
  line('targets', TARGETS.map((t) => t.label).join('; '));
  line('dose, covered share', '10 J/cm², 90 %; dose cap 3 × H*');
  line('LP solver', `${solver.name}; loaded in ${loadMs.toFixed(0)} ms`);
  line('plans made / not possible', `${plans} / ${skipped}`);
  for (const strategy of STRATEGIES) {
    const times = perPlan[strategy];
    const worst = Math.max(...times);
    const met = worst < TARGET_MS[strategy];
    line(
      `per plan, ${strategy}`,
      `median ${median(times).toFixed(1)} ms, worst ${worst.toFixed(1)} ms over ${times.length} (target < ${TARGET_MS[strategy]} ms) ${met ? 'met' : 'NOT met'}`,
    );
  }
  line('whole session (3 strategies, all distances)', `median ${median(sessions).toFixed(0)} ms, worst ${Math.max(...sessions).toFixed(0)} ms`);
  line(
    'LP solves, placements at every distance',
    `${solvesPerSession} solves in ${lpMs.toFixed(0)} ms (${(lpMs / solvesPerSession).toFixed(1)} ms each; ${units[0].id}, chest + abdomen)`,
  );
  line('total time (whole script)', `${((nowMs() - wallStart) / 1000).toFixed(2)} s`);
}

main().catch((err: unknown) => {
  console.error(`bench:planner could not run: ${err instanceof Error ? err.stack : String(err)}`);
  process.exitCode = 1;
});
