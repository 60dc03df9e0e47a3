/**
 * What a receding-horizon loop carries from one window to the next for the
 * operating limits: the net power applied last (so the ramp rate and switching
 * cost hold across re-plans, not only inside each window) and the reserve
 * revenue of the applied steps (cash, like the energy bill).
 */
import type { BatteryParams, DispatchProblem, DispatchSolution } from '../types';
import { hasMoves, limitFeatures } from './limit-features';
import { reserveRevenue } from './read-limits';

interface Applied {
  readonly chargeKw: readonly number[];
  readonly dischargeKw: readonly number[];
}

export interface CarriedLimits {
  /** Extras for the next window's problem. */
  extras(applied: Applied): { initialNetPowerKw?: number };
  /** Adds the first `steps` steps of a window's plan. */
  apply(problem: DispatchProblem, plan: DispatchSolution, steps: number): void;
  /** Reserve revenue of the steps applied so far, currency. */
  readonly reserveRevenue: number;
}

export function carriedLimits(whole: DispatchProblem): CarriedLimits {
  const moves = hasMoves(limitFeatures(whole));
  let revenue = 0;
  return {
    extras(applied) {
      const last = applied.chargeKw.length - 1;
      if (moves && last >= 0) return { initialNetPowerKw: applied.dischargeKw[last]! - applied.chargeKw[last]! };
      if (moves && whole.initialNetPowerKw !== undefined) return { initialNetPowerKw: whole.initialNetPowerKw };
      return {};
    },
    apply(problem, plan, steps) {
      if (plan.reserveUpKw || plan.reserveDownKw)
        revenue += reserveRevenue(problem, plan.reserveUpKw, plan.reserveDownKw, 0, steps);
    },
    get reserveRevenue() {
      return revenue;
    },
  };
}

/**
 * Whether a run's state between re-plans is the SoC alone and its cash the
 * schedule's alone: no ramp rate or switching cost (the last power is state too)
 * and no reserves (their revenue is not part of a stitched schedule's cost).
 */
export function stateIsSoc(inputs: {
  readonly battery: BatteryParams;
  readonly reserveUpPrice?: readonly number[];
  readonly reserveDownPrice?: readonly number[];
}): boolean {
  const { rampKwPerMin, switchingCostPerMw } = inputs.battery;
  return (
    rampKwPerMin == null &&
    (switchingCostPerMw == null || switchingCostPerMw === 0) &&
    inputs.reserveUpPrice === undefined &&
    inputs.reserveDownPrice === undefined
  );
}
