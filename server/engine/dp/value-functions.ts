import type { DpContext } from './context';
import type { ValueStore } from './value-store';
import type { WindowSolver } from './window-solver';

/** One value function V_t on the SoC window: breakpoints (kWh) and the slope of each piece (currency/kWh). */
export interface ValueFunctionShape {
  readonly lo: number;
  readonly hi: number;
  readonly breakpoints: readonly number[];
  readonly slopes: readonly number[];
}

/**
 * The cost-to-go functions V_t (t = 0..N) of a solved problem. −1000·V_t′(e)
 * is the stored-energy value (currency/MWh) of energy held at the start of
 * step t, at every SoC, not only on the optimal path.
 */
export class DpValueFunctions {
  constructor(
    readonly ctx: DpContext,
    private readonly solver: WindowSolver,
    readonly from: number,
    readonly to: number,
  ) {}

  /** The value store and the slot of V_t in it (for exact comparisons). */
  get store(): ValueStore {
    return this.solver.store;
  }

  slot(t: number): number {
    return this.solver.slotOf(t);
  }

  /** V_t for from ≤ t ≤ to. */
  at(t: number): ValueFunctionShape {
    if (!(t >= this.from && t <= this.to))
      throw new RangeError(`no value function for step ${t}: the solved steps are ${this.from}..${this.to}`);
    return this.solver.store.read(this.solver.slotOf(t));
  }

  /**
   * Interval of stored-energy values (currency/MWh) at energy e (kWh) held at
   * the start of step t: [−V_t′₊(e), −V_t′₋(e)]·1000, equal ends off the kinks.
   */
  slopeInterval(t: number, e: number): { low: number; high: number } {
    const { breakpoints, slopes } = this.at(t);
    let low = Infinity;
    let high = -Infinity;
    for (let i = 0; i < slopes.length; i++) {
      const a = breakpoints[i] ?? 0;
      const b = breakpoints[i + 1] ?? 0;
      const value = -(slopes[i] ?? 0) * 1000;
      if (e >= a && e <= b) {
        if (value < low) low = value;
        if (value > high) high = value;
      }
    }
    if (e <= (breakpoints[0] ?? 0)) high = Infinity;
    if (e >= (breakpoints[breakpoints.length - 1] ?? 0)) low = -Infinity;
    return { low, high };
  }
}
