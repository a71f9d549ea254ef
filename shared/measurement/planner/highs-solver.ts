/**
 * The one module that knows the LP solver package: HiGHS (University of Edinburgh) compiled to
 * WebAssembly by the `highs` package. Loading is asynchronous (the .wasm file is fetched or
 * read once); solves are synchronous afterwards.
 *
 * Where the .wasm file comes from: on Node the loader reads it beside its own module; in a
 * browser build the bundler moves it, so the caller passes its URL (`wasmUrl`, e.g. from Vite's
 * `highs/runtime?url`).
 */
import loadHighs, { type Highs } from 'highs';
import type { LinearProgram, LpOutcome, LpSession, LpSolver } from './lp-solver.ts';

export interface HighsSolverOptions {
  /** URL of highs.wasm where a bundler has moved it; omit on Node. */
  wasmUrl?: string;
}

/** HiGHS model status codes (highs `constants.modelStatus`). */
const OPTIMAL = 7;
const INFEASIBLE = 8;
/** Our programmes minimise non-negative times at positive cost, so they are never unbounded. */
const UNBOUNDED_OR_INFEASIBLE = 9;

function toHighsBounds(values: Float64Array, infinity: number): Float64Array {
  return values.map((v) => (v === Infinity ? infinity : v === -Infinity ? -infinity : v));
}

function openSession(highs: Highs, lp: LinearProgram): LpSession {
  const model = highs.createModel({
    numCols: lp.numCols,
    numRows: lp.numRows,
    colCost: lp.colCost,
    colLower: new Float64Array(lp.numCols),
    colUpper: toHighsBounds(lp.colUpper, highs.infinity),
    rowLower: toHighsBounds(lp.rowLower, highs.infinity),
    rowUpper: toHighsBounds(lp.rowUpper, highs.infinity),
    matrix: { format: 'csc', numRows: lp.numRows, numCols: lp.numCols, ...lp.matrix },
  });
  // Presolve costs more than it saves on these small dense programmes (about 5× here), and
  // without it a re-solve after a bound change starts from the last basis.
  model.options.set({ output_flag: false, presolve: 'off' });
  const bound = (v: number) => (v === Infinity ? highs.infinity : v === -Infinity ? -highs.infinity : v);
  return {
    solve(): LpOutcome {
      const { modelStatus } = model.run();
      if (modelStatus === INFEASIBLE || modelStatus === UNBOUNDED_OR_INFEASIBLE) return { status: 'infeasible' };
      if (modelStatus !== OPTIMAL) return { status: 'failed', message: `HiGHS ended with model status ${modelStatus}` };
      const { colValue, rowDual } = model.getSolution();
      return { status: 'optimal', x: colValue, rowDual, objective: model.getObjectiveValue() };
    },
    setRowBounds(row, lower, upper) {
      model.changeRowBounds(row, bound(lower), bound(upper));
    },
    close() {
      model.dispose();
    },
  };
}

export function highsSolver(highs: Highs): LpSolver {
  return { name: `HiGHS ${highs.version.string} (highs package, WebAssembly)`, open: (lp) => openSession(highs, lp) };
}

/** Loads the WebAssembly solver (once per call: keep the result). */
export async function loadHighsSolver(options: HighsSolverOptions = {}): Promise<LpSolver> {
  const { wasmUrl } = options;
  const highs = await loadHighs(wasmUrl ? { locateFile: (file: string) => (file.endsWith('.wasm') ? wasmUrl : file) } : {});
  return highsSolver(highs);
}
