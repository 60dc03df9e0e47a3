/**
 * GLPK (glpk.js, WebAssembly) backend. glpk.js takes an object model with named
 * columns and rows; we use short generic names (x<j>, r<i>) because every name is
 * marshalled into WebAssembly and back on each call. Presolve is off: with it on,
 * GLPK reports an infeasible or unbounded model as "undefined" instead of saying
 * which, and on the small models this backend is chosen for it saves no time.
 */
import type { LP } from 'glpk.js/node';
import { glpk } from './solver-runtime';
import { lpFailure, type LpModel, type LpResult } from './lp-model';

function boundType(lower: number, upper: number): { type: number; lb: number; ub: number } {
  const hasLower = Number.isFinite(lower);
  const hasUpper = Number.isFinite(upper);
  if (hasLower && hasUpper) {
    return lower === upper ? { type: glpk.GLP_FX, lb: lower, ub: upper } : { type: glpk.GLP_DB, lb: lower, ub: upper };
  }
  if (hasLower) return { type: glpk.GLP_LO, lb: lower, ub: 0 };
  if (hasUpper) return { type: glpk.GLP_UP, lb: 0, ub: upper };
  return { type: glpk.GLP_FR, lb: 0, ub: 0 };
}

/** The glpk.js object model of an LpModel (also used by the benchmark's plain loop). */
export function toGlpkModel(model: LpModel): LP {
  const objectiveVars: { name: string; coef: number }[] = [];
  const bounds: NonNullable<LP['bounds']> = [];
  for (let j = 0; j < model.numCols; j++) {
    const name = `x${j}`;
    if (model.colCost[j] !== 0) objectiveVars.push({ name, coef: model.colCost[j]! });
    bounds.push({ name, ...boundType(model.colLower[j]!, model.colUpper[j]!) });
  }
  const subjectTo: LP['subjectTo'] = [];
  for (let i = 0; i < model.numRows; i++) {
    const vars: { name: string; coef: number }[] = [];
    for (let k = model.rowStarts[i]!; k < model.rowStarts[i + 1]!; k++) {
      vars.push({ name: `x${model.colIndex[k]!}`, coef: model.values[k]! });
    }
    subjectTo.push({ name: `r${i}`, vars, bnds: boundType(model.rowLower[i]!, model.rowUpper[i]!) });
  }
  return {
    name: 'dispatch',
    objective: { direction: glpk.GLP_MIN, name: 'cost', vars: objectiveVars },
    subjectTo,
    bounds,
  };
}

export function solveWithGlpk(model: LpModel): LpResult {
  const started = performance.now();
  const seconds = () => (performance.now() - started) / 1000;
  let result;
  try {
    result = glpk.solve(toGlpkModel(model), { msglev: glpk.GLP_MSG_OFF, presol: false });
  } catch (error) {
    return lpFailure('error', 'glpk', `GLPK failed: ${String(error)}`, seconds());
  }
  const { status, vars, dual } = result.result;
  if (status === glpk.GLP_NOFEAS || status === glpk.GLP_INFEAS) {
    return lpFailure('infeasible', 'glpk', 'no schedule satisfies every limit (GLPK)', seconds());
  }
  if (status === glpk.GLP_UNBND) {
    return lpFailure('unbounded', 'glpk', 'the cost can be lowered without limit (GLPK)', seconds());
  }
  if (status !== glpk.GLP_OPT || !dual) {
    return lpFailure('error', 'glpk', `GLPK ended with status ${status}`, seconds());
  }
  const x = new Float64Array(model.numCols);
  for (let j = 0; j < model.numCols; j++) x[j] = vars[`x${j}`] ?? 0;
  const rowDual = new Float64Array(model.numRows);
  for (let i = 0; i < model.numRows; i++) rowDual[i] = dual[`r${i}`] ?? 0;
  return {
    status: 'optimal',
    objective: result.result.z + model.offset,
    x,
    rowDual,
    backend: 'glpk',
    seconds: seconds(),
  };
}
