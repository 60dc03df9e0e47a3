/**
 * HiGHS (highs-js, WebAssembly) backend. We hand HiGHS the model as sparse arrays
 * through its persistent API instead of CPLEX LP text: on the year-long dispatch
 * LP, parsing the text took longer than solving (measured by `npm run bench`).
 * One native instance per session is reused, so a sequence of similar models
 * (receding-horizon windows) pays for allocation once and can start from the
 * previous window's basis.
 */
import { highs } from './solver-runtime';
import { lpFailure, type LpBasis, type LpModel, type LpResult } from './lp-model';

type RawModel = ReturnType<typeof highs.raw.createModel>;

const status = highs.constants.modelStatus;

/** Options that differ from HiGHS's defaults, and why. */
const SESSION_OPTIONS: Readonly<Record<string, boolean | string>> = {
  output_flag: false,
  // Presolve costs more than it saves on these sparse banded models (year LP:
  // 0.25 s without against 0.40 s with, measured here).
  presolve: 'off',
};

/**
 * Column-wise copy of the row-wise matrix. HiGHS works by columns: given the same
 * year-long model by rows it took 4.4 s against 0.7 s by columns (measured here,
 * same iteration count), so the transpose (linear time) always pays.
 */
function columnWise(model: LpModel) {
  const starts = new Int32Array(model.numCols + 1);
  for (let k = 0; k < model.colIndex.length; k++) starts[model.colIndex[k]! + 1]!++;
  for (let j = 0; j < model.numCols; j++) starts[j + 1]! += starts[j]!;
  const next = starts.slice(0, model.numCols);
  const indices = new Int32Array(model.values.length);
  const values = new Float64Array(model.values.length);
  for (let i = 0; i < model.numRows; i++) {
    for (let k = model.rowStarts[i]!; k < model.rowStarts[i + 1]!; k++) {
      const at = next[model.colIndex[k]!]!++;
      indices[at] = i;
      values[at] = model.values[k]!;
    }
  }
  return { format: 'csc' as const, numRows: model.numRows, numCols: model.numCols, starts, indices, values };
}

function toModelData(model: LpModel) {
  return {
    numCols: model.numCols,
    numRows: model.numRows,
    offset: model.offset,
    colCost: model.colCost,
    colLower: model.colLower,
    colUpper: model.colUpper,
    rowLower: model.rowLower,
    rowUpper: model.rowUpper,
    matrix: columnWise(model),
  };
}

function sameArray(a: ArrayLike<number>, b: ArrayLike<number>): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** Same columns, rows and matrix: only costs and bounds may differ. */
function sameStructure(a: LpModel, b: LpModel): boolean {
  if (a.values === b.values && a.colIndex === b.colIndex && a.rowStarts === b.rowStarts) return true;
  return (
    a.numCols === b.numCols &&
    a.numRows === b.numRows &&
    sameArray(a.rowStarts, b.rowStarts) &&
    sameArray(a.colIndex, b.colIndex) &&
    sameArray(a.values, b.values)
  );
}

function changed(before: Float64Array, after: Float64Array, also?: [Float64Array, Float64Array]): number[] {
  const list: number[] = [];
  for (let i = 0; i < after.length; i++) if (before[i] !== after[i] || (also && also[0][i] !== also[1][i])) list.push(i);
  return list;
}

/**
 * Moves the loaded model to `next` by changing only the costs and bounds that
 * differ. Consecutive receding-horizon windows share their matrix, and handing
 * HiGHS a whole model costs more in highs-js's copying and checking than the
 * warm-started simplex itself (measured on the year at H = 24 h).
 */
function updateInPlace(raw: RawModel, prev: LpModel, next: LpModel): boolean {
  const all = (n: number) => ({ kind: 'range' as const, from: 0, to: n - 1 });
  const cost = changed(prev.colCost, next.colCost);
  if (cost.length > 0) {
    const ok =
      cost.length <= 4
        ? cost.every((j) => raw.changeColCost(j, next.colCost[j]!).status !== -1)
        : raw.changeColsCost(all(next.numCols), next.colCost).status !== -1;
    if (!ok) return false;
  }
  const cols = changed(prev.colLower, next.colLower, [prev.colUpper, next.colUpper]);
  if (cols.length > 0) {
    const ok =
      cols.length <= 4
        ? cols.every((j) => raw.changeColBounds(j, next.colLower[j]!, next.colUpper[j]!).status !== -1)
        : raw.changeColsBounds(all(next.numCols), next.colLower, next.colUpper).status !== -1;
    if (!ok) return false;
  }
  const rows = changed(prev.rowLower, next.rowLower, [prev.rowUpper, next.rowUpper]);
  if (rows.length > 0) {
    const ok =
      rows.length <= 4
        ? rows.every((i) => raw.changeRowBounds(i, next.rowLower[i]!, next.rowUpper[i]!).status !== -1)
        : raw.changeRowsBounds(all(next.numRows), next.rowLower, next.rowUpper).status !== -1;
    if (!ok) return false;
  }
  return prev.offset === next.offset || raw.changeObjectiveOffset(next.offset).status !== -1;
}

export interface HighsSolveOptions {
  /** Start from this basis when its sizes match the model (warm start). */
  readonly warmBasis?: LpBasis;
  /** Return the final basis so the next model can start from it. */
  readonly keepBasis?: boolean;
}

/** A reusable HiGHS instance. Call dispose() when done; GC does not free Wasm memory. */
export class HighsSession {
  private raw: RawModel | null = null;
  /** The model currently loaded in `raw`. */
  private loaded: LpModel | null = null;

  private instance(): RawModel {
    if (!this.raw) {
      this.raw = highs.raw.createModel();
      for (const [name, value] of Object.entries(SESSION_OPTIONS)) this.raw.setOptionValue(name, value);
    }
    return this.raw;
  }

  solve(model: LpModel, options: HighsSolveOptions = {}): LpResult {
    const started = performance.now();
    const seconds = () => (performance.now() - started) / 1000;
    try {
      const raw = this.instance();
      const updated = this.loaded !== null && sameStructure(this.loaded, model) && updateInPlace(raw, this.loaded, model);
      this.loaded = null;
      if (!updated && raw.passLp(toModelData(model)).status === -1) {
        return lpFailure('error', 'highs', 'HiGHS rejected the model data', seconds());
      }
      this.loaded = model;
      const basis = options.warmBasis;
      if (basis && basis.colStatus.length === model.numCols && basis.rowStatus.length === model.numRows) {
        // A basis HiGHS cannot use is not an error: it then starts from scratch.
        if (raw.setBasis(basis).status === -1) raw.setLogicalBasis();
      }
      if (raw.run().status === -1) return lpFailure('error', 'highs', 'HiGHS failed to run', seconds());
      const modelStatus = raw.getModelStatus();
      if (modelStatus === status.infeasible) {
        return lpFailure('infeasible', 'highs', 'no schedule satisfies every limit (HiGHS)', seconds());
      }
      if (modelStatus === status.unbounded || modelStatus === status.unboundedOrInfeasible) {
        return lpFailure('unbounded', 'highs', 'the cost can be lowered without limit (HiGHS)', seconds());
      }
      if (modelStatus !== status.optimal) {
        return lpFailure('error', 'highs', `HiGHS ended with model status ${modelStatus}`, seconds());
      }
      const solution = raw.getSolution();
      if (solution.status === -1) return lpFailure('error', 'highs', 'HiGHS returned no solution', seconds());
      const finalBasis = options.keepBasis ? raw.getBasis() : undefined;
      return {
        status: 'optimal',
        objective: raw.getObjectiveValue(),
        x: solution.value.colValue,
        rowDual: solution.value.rowDual,
        ...(finalBasis && finalBasis.status !== -1 ? { basis: finalBasis.value } : {}),
        backend: 'highs',
        seconds: seconds(),
      };
    } catch (error) {
      // JavaScript-side validation errors of highs-js; solver outcomes never get here.
      this.dispose();
      return lpFailure('error', 'highs', `HiGHS failed: ${String(error)}`, seconds());
    }
  }

  dispose(): void {
    this.raw?.dispose();
    this.raw = null;
    this.loaded = null;
  }
}

const shared = new HighsSession();

/** One cold HiGHS solve on the thread's shared instance. */
export function solveWithHighs(model: LpModel, options: HighsSolveOptions = {}): LpResult {
  return shared.solve(model, options);
}
