/**
 * k placements of one unit: the unit is moved between positions on a lattice and stays tᵢ
 * minutes at position i. The dose at each sample is linear in the times, so the shortest session
 * is a linear programme:
 *
 *   minimise Σ tᵢ  subject to  Σᵢ Eₛᵢ·tᵢ·60/1000 ≥ H*    for every sample s that must be covered
 *                              Σᵢ Eₛᵢ·tᵢ·60/1000 ≤ m·H*  for every sample (the dose cap, if any)
 *                              0 ≤ tᵢ ≤ t_max            (the cap on minutes per position, if any)
 *
 * with Eₛᵢ in mW/cm² (zero where position i's measured grid does not reach s), t in minutes and
 * H* in J/cm². Solved by an LP solver (lp-solver.ts), never by hand.
 *
 * Covered share f < 1, the rule: start by requiring every sample some position can reach; while
 * more samples are required than k = ⌈f·N⌉, drop the required samples that cost the most (the
 * largest row duals: the minutes saved per J/cm² less at that sample), a quarter of the surplus
 * at a time, and solve again. When the solver finds no plan (the caps cannot be kept), drop the
 * dimmest required samples instead. The required set never falls below k, so the covered share
 * stays ≥ f. The dropping is a heuristic; so the samples a centred unit covers best (the
 * one-position plan's set) are also tried, and the shorter of the two plans is kept: k
 * placements never take longer than one centred position at the same distance.
 */
import type { LinearProgram, LpSolver } from './lp-solver.ts';
import { requiredSamples } from './plan-figures.ts';

export interface PlacementProblem {
  /** irradiance[i][s]: mW/cm² at sample s with the unit at position i; NaN where not measured. */
  irradiance: readonly Float64Array[];
  doseJCm2: number;
  coverShare: number;
  maxDoseMultiple: number | null;
  maxMinutesPerPosition: number | null;
  /** A position whose own best-covered samples are tried as a second required set (the centre). */
  centerPosition?: number | null;
}

export type PlacementSolution = { minutes: Float64Array; solves: number } | { reason: string; solves: number };

/** J/cm² per minute at 1 mW/cm²: 60 s × 1 mW/cm² = 0.06 J/cm². */
const JCM2_PER_MINUTE_PER_MWCM2 = 60 / 1000;
const MAX_SOLVES = 60;

/**
 * The programme with one row per sample some position reaches (row s of `reachable`), each
 * required (lower bound H*) as `required` says, capped at m·H* when there is a dose cap.
 */
function buildProgram(problem: PlacementProblem, rows: number[], required: Uint8Array): LinearProgram {
  const { irradiance, doseJCm2, maxDoseMultiple, maxMinutesPerPosition } = problem;
  const cap = maxDoseMultiple === null ? Infinity : maxDoseMultiple * doseJCm2;
  const starts = [0];
  const indices: number[] = [];
  const values: number[] = [];
  for (const column of irradiance) {
    rows.forEach((s, row) => {
      const e = column[s];
      if (!(e > 0)) return; // no light, or not measured: no share of the dose
      indices.push(row);
      values.push(e * JCM2_PER_MINUTE_PER_MWCM2);
    });
    starts.push(indices.length);
  }
  const numCols = irradiance.length;
  return {
    numCols,
    numRows: rows.length,
    colCost: new Float64Array(numCols).fill(1),
    colUpper: new Float64Array(numCols).fill(maxMinutesPerPosition ?? Infinity),
    rowLower: Float64Array.from(rows, (s) => (required[s] ? doseJCm2 : -Infinity)),
    rowUpper: new Float64Array(rows.length).fill(cap),
    matrix: { starts: Int32Array.from(starts), indices: Int32Array.from(indices), values: Float64Array.from(values) },
  };
}

interface Attempt {
  minutes: Float64Array | null;
  total: number;
  solves: number;
}

/**
 * The dropping rule from a starting required set, down to k samples. One solver session: each
 * drop only lowers some rows' lower bounds, so every solve starts from the previous answer.
 */
function solveWithDropping(problem: PlacementProblem, rows: number[], start: Uint8Array, k: number, best: Float64Array, solver: LpSolver): Attempt {
  const required = Uint8Array.from(start);
  let count = rows.reduce((n, s) => n + required[s], 0);
  const cap = problem.maxDoseMultiple === null ? Infinity : problem.maxDoseMultiple * problem.doseJCm2;
  const session = solver.open(buildProgram(problem, rows, required));
  try {
    let solves = 0;
    while (solves < MAX_SOLVES) {
      const outcome = session.solve();
      solves++;
      if (outcome.status === 'failed') throw new Error(`LP solver failed: ${outcome.message}`);
      const surplus = count - k;
      let order: number[]; // rows, costliest first
      if (outcome.status === 'optimal') {
        if (surplus <= 0) return { minutes: outcome.x, total: outcome.objective, solves };
        order = [];
        rows.forEach((s, row) => {
          if (required[s] && outcome.rowDual[row] > 1e-12) order.push(row);
        });
        if (order.length === 0) return { minutes: outcome.x, total: outcome.objective, solves };
        order.sort((a, b) => outcome.rowDual[b] - outcome.rowDual[a]);
      } else {
        if (surplus <= 0) return { minutes: null, total: Infinity, solves };
        order = [];
        rows.forEach((s, row) => {
          if (required[s]) order.push(row);
        });
        order.sort((a, b) => best[rows[a]] - best[rows[b]]);
      }
      const drop = Math.min(order.length, Math.max(1, Math.ceil(surplus / 4)));
      for (let q = 0; q < drop; q++) {
        required[rows[order[q]]] = 0;
        session.setRowBounds(order[q], -Infinity, cap);
      }
      count -= drop;
    }
    return { minutes: null, total: Infinity, solves };
  } finally {
    session.close();
  }
}

export function solvePlacements(problem: PlacementProblem, solver: LpSolver): PlacementSolution {
  const { irradiance, coverShare } = problem;
  const sampleCount = irradiance[0]?.length ?? 0;
  const k = requiredSamples(sampleCount, coverShare);
  // Best irradiance any position gives each sample: 0 where none reaches it.
  const best = new Float64Array(sampleCount);
  for (const column of irradiance) for (let s = 0; s < sampleCount; s++) if (column[s] > best[s]) best[s] = column[s];
  const rows = [...best.keys()].filter((s) => best[s] > 0);
  if (irradiance.length === 0 || rows.length < k) {
    return { reason: `only ${((100 * rows.length) / Math.max(1, sampleCount)).toFixed(1)} % of the target gets measured light from the lattice positions`, solves: 0 };
  }
  const reachable = new Uint8Array(sampleCount);
  for (const s of rows) reachable[s] = 1;

  const attempts = [solveWithDropping(problem, rows, reachable, k, best, solver)];
  const center = problem.centerPosition;
  if (center !== null && center !== undefined && k < rows.length) {
    // The k samples the centred position lights best: the one-position plan's covered set.
    const column = irradiance[center];
    const order = rows.filter((s) => column[s] > 0).sort((a, b) => column[b] - column[a]);
    if (order.length >= k) {
      const seed = new Uint8Array(sampleCount);
      for (let q = 0; q < k; q++) seed[order[q]] = 1;
      attempts.push(solveWithDropping(problem, rows, seed, k, best, solver));
    }
  }
  const solves = attempts.reduce((a, b) => a + b.solves, 0);
  const winner = attempts.reduce((a, b) => (b.total < a.total ? b : a));
  if (!winner.minutes) return { reason: 'no placement plan keeps the caps while covering the required share', solves };
  return { minutes: winner.minutes, solves };
}
