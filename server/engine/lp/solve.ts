/**
 * The one entry point to the LP solvers. Outcomes (infeasible, unbounded, solver
 * failure) come back as a status, never as an exception.
 */
import { solveWithGlpk } from './glpk-backend';
import { HighsSession, solveWithHighs } from './highs-backend';
import { lpFailure, modelSize, type LpBackend, type LpBasis, type LpModel, type LpResult } from './lp-model';

/**
 * Models up to this size (non-zeros + columns) go to GLPK, larger ones to HiGHS.
 * Measured by `npm run bench` ("backendCrossover") on the 2-core machine with
 * cold solves of pure-arbitrage windows: GLPK is quicker on small models, where
 * HiGHS's fixed set-up cost dominates; HiGHS is quicker from about 48 hourly steps
 * on and far quicker on long ones (year: HiGHS 0.25 s, GLPK 7.8 s).
 */
export const GLPK_MAX_SIZE = 600;

export interface SolveOptions {
  /** 'auto' (default) picks by model size, see GLPK_MAX_SIZE. */
  readonly backend?: 'auto' | LpBackend;
  /**
   * Reuse this HiGHS instance (receding-horizon loops). When given, HiGHS is used
   * whatever the size, because the warm start is what makes a sequence fast.
   */
  readonly session?: HighsSession;
  /** Warm-start basis for HiGHS (ignored by GLPK). */
  readonly warmBasis?: LpBasis;
  /** Ask HiGHS for the final basis. */
  readonly keepBasis?: boolean;
}

export function pickBackend(model: LpModel, options: SolveOptions = {}): LpBackend {
  if (options.backend && options.backend !== 'auto') return options.backend;
  if (options.session) return 'highs';
  return modelSize(model) <= GLPK_MAX_SIZE ? 'glpk' : 'highs';
}

export function solve(model: LpModel, options: SolveOptions = {}): LpResult {
  const backend = pickBackend(model, options);
  if (model.numCols === 0) return lpFailure('error', backend, 'the model has no variables');
  if (backend === 'glpk') return solveWithGlpk(model);
  const highsOptions = {
    ...(options.warmBasis ? { warmBasis: options.warmBasis } : {}),
    ...(options.keepBasis ? { keepBasis: true } : {}),
  };
  return options.session ? options.session.solve(model, highsOptions) : solveWithHighs(model, highsOptions);
}

export { HighsSession };
