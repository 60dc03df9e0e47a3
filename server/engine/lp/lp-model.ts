/**
 * Plain LP data, independent of any solver: minimise offset + colCost·x subject to
 * rowLower ≤ A·x ≤ rowUpper and colLower ≤ x ≤ colUpper. A is stored by rows (CSR)
 * because every consumer here (LP text, glpk.js, HiGHS, javascript-lp-solver in the
 * tests) walks it row by row. Missing bounds are ±Infinity. Typed arrays are treated
 * as read-only once a model is built; nothing in the engine mutates a built model.
 */
export interface LpModel {
  readonly numCols: number;
  readonly numRows: number;
  readonly colCost: Float64Array;
  readonly colLower: Float64Array;
  readonly colUpper: Float64Array;
  readonly rowLower: Float64Array;
  readonly rowUpper: Float64Array;
  /** CSR row pointers, length numRows + 1. */
  readonly rowStarts: Int32Array;
  /** CSR column index per non-zero. */
  readonly colIndex: Int32Array;
  /** CSR coefficient per non-zero. */
  readonly values: Float64Array;
  /** Constant added to the objective. */
  readonly offset: number;
  /** Optional readable names (LP text, debugging); solvers fall back to x<j>/r<i>. */
  readonly colNames?: readonly string[];
  readonly rowNames?: readonly string[];
}

export type LpStatus = 'optimal' | 'infeasible' | 'unbounded' | 'error';
export type LpBackend = 'highs' | 'glpk';

/** A simplex basis in HiGHS's encoding (0 lower, 1 basic, 2 upper, 3 zero, 4 nonbasic). */
export interface LpBasis {
  readonly colStatus: Int32Array;
  readonly rowStatus: Int32Array;
}

export interface LpResult {
  readonly status: LpStatus;
  /** Why the status is not optimal, in words. */
  readonly message?: string;
  /** Objective value including the offset (NaN unless optimal). */
  readonly objective: number;
  /** Primal values, length numCols (empty unless optimal). */
  readonly x: Float64Array;
  /**
   * Row duals as the derivative of the optimal objective with respect to the row's
   * active bound (minimisation), length numRows (empty unless optimal).
   */
  readonly rowDual: Float64Array;
  /** Final basis (HiGHS only, when asked for), for warm starts of a similar model. */
  readonly basis?: LpBasis;
  readonly backend: LpBackend;
  /** Wall-clock seconds spent in the backend, model hand-over included. */
  readonly seconds: number;
}

export function lpFailure(status: Exclude<LpStatus, 'optimal'>, backend: LpBackend, message: string, seconds = 0): LpResult {
  return {
    status,
    message,
    objective: Number.NaN,
    x: new Float64Array(0),
    rowDual: new Float64Array(0),
    backend,
    seconds,
  };
}

/** Size measure used to pick a backend: structural non-zeros plus columns. */
export function modelSize(model: LpModel): number {
  return model.values.length + model.numCols;
}

/** Reduced costs d = c − Aᵀy for a dual vector y (row duals as in LpResult). */
export function reducedCosts(model: LpModel, rowDual: Float64Array): Float64Array {
  const d = Float64Array.from(model.colCost);
  for (let i = 0; i < model.numRows; i++) {
    const y = rowDual[i]!;
    if (y === 0) continue;
    for (let k = model.rowStarts[i]!; k < model.rowStarts[i + 1]!; k++) {
      d[model.colIndex[k]!]! -= model.values[k]! * y;
    }
  }
  return d;
}
