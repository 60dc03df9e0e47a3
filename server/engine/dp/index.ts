/**
 * The exact dynamic-programming path of the dispatch engine (docs/model.md):
 * for one battery whose steps are coupled only through the SoC, the cost-to-go
 * is convex piecewise linear in the stored energy and a backward pass of
 * sorted-slope merges solves the LP exactly, with the stored-energy value at
 * every SoC as a by-product.
 */
export { canSolveWithDp, checkDpInput, type DpEligibility } from './can-solve';
export { solveDispatchDp, type DpSolution, type DpSolveOptions } from './solve';
export { DpValueFunctions, type ValueFunctionShape } from './value-functions';
export {
  createDpClosedLoop,
  runClosedLoopDp,
  type DpClosedLoop,
  type DpClosedLoopOptions,
  type DpClosedLoopResult,
  type DpWindowPlan,
} from './closed-loop';
export type { DpWorkStats } from './window-solver';
export { valueCurves, type ValueCurve, type ValueCurveSource } from './value-curves';
export { decisionHorizon, type DecisionHorizon } from './decision-horizon';
export { planInsights, type DpPlanInsights } from './plan-insights';
