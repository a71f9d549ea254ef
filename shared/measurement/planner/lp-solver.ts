/**
 * What the planner needs from a linear-programming solver, and nothing more, so the solver
 * package stays behind one module (highs-solver.ts) and could be swapped.
 */

/**
 * Minimise Σ cost_j·x_j subject to rowLower ≤ A·x ≤ rowUpper and 0 ≤ x ≤ colUpper.
 * A is given column by column (compressed sparse columns): column j's entries are
 * values[starts[j] … starts[j + 1] − 1] in rows indices[…]. Infinity stands for "no bound".
 */
export interface LinearProgram {
  numCols: number;
  numRows: number;
  colCost: Float64Array;
  colUpper: Float64Array;
  rowLower: Float64Array;
  rowUpper: Float64Array;
  matrix: { starts: Int32Array; indices: Int32Array; values: Float64Array };
}

export type LpOutcome =
  | {
      status: 'optimal';
      x: Float64Array;
      /** Row duals (shadow prices): objective change per unit change of a binding row bound. */
      rowDual: Float64Array;
      objective: number;
    }
  | { status: 'infeasible' }
  | { status: 'failed'; message: string };

/**
 * One programme held by the solver between solves, so that a solve after a change of row bounds
 * starts from the last answer instead of from scratch.
 */
export interface LpSession {
  solve(): LpOutcome;
  setRowBounds(row: number, lower: number, upper: number): void;
  /** Frees the solver's memory; the session cannot be used afterwards. */
  close(): void;
}

export interface LpSolver {
  /** Name and version, for reports. */
  name: string;
  open(lp: LinearProgram): LpSession;
}

/** Solves one programme once. */
export function minimize(solver: LpSolver, lp: LinearProgram): LpOutcome {
  const session = solver.open(lp);
  try {
    return session.solve();
  } finally {
    session.close();
  }
}
