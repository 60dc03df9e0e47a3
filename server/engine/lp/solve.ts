/**
 * The one entry point to the LP solvers. Outcomes (infeasible, unbounded, solver
 * failure) come back as a status, never as an exception.
 */
import { solveWithGlpk } from './glpk-backend';
import { HighsSession, solveWithHighs } from './highs-backend';
import { lpFailure, modelSize, type LpBackend, type LpBasis, type LpModel, type LpResult } from './lp-model';

/**
 * Models up to this size (non-zeros + columns) go to GLPK, larger ones to HiGHS.
 * Measured on the 2-core machine (`npm run bench`, section backendCrossover; CPU
 * ms per solve of pure-arbitrage windows after warm-up, min of 3 rounds):
 *   steps (size)   6 (41)  12 (83)  24 (167)  48 (335)  96 (671)  168 (1175)
 *   GLPK            0.09    0.20     0.35      0.97      2.0       5.3
 *   HiGHS           0.20    0.23     0.28      0.40      0.71      1.2
 * HiGHS's fixed cost per run dominates only the smallest models; the year-long
 * LP takes HiGHS about 0.3 s and GLPK several seconds.
 */
export const GLPK_MAX_SIZE = 120;

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
