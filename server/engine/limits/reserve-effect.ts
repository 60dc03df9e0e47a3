/**
 * What holding reserve did to the rest of the plan: the same problem solved
 * again with reserves off. Holding reserve can only make the remaining objective
 * (energy, degradation, demand charge, switching penalty, terminal value) worse,
 * since r = 0 keeps every schedule of the plain problem, so
 *   headroomCost = (objective + reserveRevenue) − objective without reserves ≥ 0
 * is the arbitrage margin the headroom took, and reserveRevenue − headroomCost
 * ≥ 0 what stacking the reserve adds.
 */
import type { DispatchProblem, DispatchSolution } from '../types';
import { solveDispatch, type DispatchOptions } from '../dispatch/solve-dispatch';

export interface ReserveEffect {
  /** Objective of the same problem without reserves, currency. */
  readonly objectiveWithoutReserves: number;
  /** Cash cost (no reserve revenue) of that plan, currency. */
  readonly costWithoutReserves: number;
  /** Arbitrage margin given up to hold the reserve, currency (≥ 0). */
  readonly headroomCost: number;
  /** Reserve revenue minus the headroom cost, currency (≥ 0). */
  readonly stackedGain: number;
}

/** The problem with its reserve prices and duration taken away. */
export function withoutReserves(problem: DispatchProblem): DispatchProblem {
  const { reserveUpPrice: _up, reserveDownPrice: _down, reserveHours: _hours, ...rest } = problem;
  return rest;
}

/** The reserve effect of an optimal solution with reserves, or null when it holds none or the comparison fails. */
export function reserveEffect(
  problem: DispatchProblem,
  solution: DispatchSolution,
  options: DispatchOptions = {},
): ReserveEffect | null {
  if (solution.status !== 'optimal' || solution.reserveRevenue === undefined) return null;
  const plain = solveDispatch(withoutReserves(problem), options);
  if (plain.status !== 'optimal') return null;
  const headroomCost = Math.max(0, solution.objective + solution.reserveRevenue - plain.objective);
  return {
    objectiveWithoutReserves: plain.objective,
    costWithoutReserves: plain.cost,
    headroomCost,
    stackedGain: solution.reserveRevenue - headroomCost,
  };
}
