/**
 * Public surface of the dispatch engine (pure computation: no database, no HTTP).
 * Units: kW, kWh, hours; prices in currency/MWh. Every function returns a status
 * or an `{ ok: false, issue }` for bad inputs and solver outcomes; none throws
 * for them.
 */
export type * from './types';
export { alignInputs, type AlignedInputs, type DispatchInputs, type ProfileSeries } from './inputs/align-inputs';
export { problemFor, socPctToKwh, stepIndexOf, usableEnergyKwh } from './inputs/problem-for';
export { buildDispatchModel, type DispatchModel } from './model/build-dispatch-model';
export { validateProblem, type InputIssue } from './model/validate-problem';
export { solve, pickBackend, HighsSession, GLPK_MAX_SIZE, type SolveOptions } from './lp/solve';
export type { LpModel, LpResult, LpStatus, LpBackend } from './lp/lp-model';
export { writeLpText } from './lp/lp-text';
export { solveDispatch, type DispatchOptions } from './dispatch/solve-dispatch';
export { scheduleCost } from './dispatch/schedule-cost';
export { representativeDay, type RepresentativeDay, type DaySelection } from './steady/representative-day';
export { solveSteadyCycle, steadyValueAt, steadySocAt, type SteadyCycle, type SteadySlot } from './steady/solve-steady-cycle';
export { parseTerminal, terminalLabel, terminalRuleFor, type TerminalChoice } from './terminal/terminal-choice';
export { solveReferencePath, type ReferencePath, type PathRequest } from './reference/solve-reference-path';
export { summarizePath, type PathSummary, type SeriesPoint } from './reference/path-summary';
export { solvePlan, type Plan, type PlanRequest } from './plan/solve-plan';
export { canSolveWithDp, type DpEligibility } from './dp';
export type { PlanTurnpike } from './plan/plan-turnpike';
export {
  arcFigures,
  commitWindowSteps,
  excursionFigures,
  DEFAULT_BAND_FRACTION,
  type ArcFigures,
  type Excursions,
  type ExcursionStretch,
} from './turnpike/turnpike-figures';
export {
  durationWords,
  excursionWords,
  leavingWords,
  planWordsFigures,
  turnpikeWords,
  type TurnpikeWordsFigures,
} from './turnpike/turnpike-words';
export {
  money,
  netFigures,
  netFiguresOfCost,
  noBatteryCost,
  perMwh,
  type NetFigures,
  type StoredEnergyValuation,
  type WindowSchedule,
} from './value/net-figures';
export { COMMON_PRACTICE_CYCLES_PER_DAY, cyclingCheck, steadyCyclingCheck, type CyclingCheck } from './plan/cycling-check';
export { runClosedLoop, type ClosedLoopRequest, type ClosedLoopRun } from './study/run-closed-loop';
export { runClosedLoopParallel } from './study/parallel-closed-loop';
export { runHorizonStudy, type HorizonStudy, type StudyRequest, type StudyRun } from './study/run-horizon-study';
export { valueGapPct } from './study/valued-run';
export { recommendHorizon, DEFAULT_GAP_TARGET_PCT, type Recommendation } from './study/recommend-horizon';
