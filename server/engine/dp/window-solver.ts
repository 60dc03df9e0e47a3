import type { TerminalRule } from '../types';
import { backwardStep } from './backward-step';
import { writeTerminal, type DpContext } from './context';
import { diagnoseInfeasible } from './diagnose';
import { forwardStep, newForwardStepResult } from './forward-step';
import { PlanRing } from './plan-ring';
import { sameBits, ValueStore } from './value-store';

/** Work counters, for the benchmark and for tests that check reuse happened. */
export interface DpWorkStats {
  backwardSteps: number;
  backwardStepsReused: number;
  forwardSteps: number;
  forwardStepsReused: number;
}

/**
 * Solves windows [start, end) of one problem by backward and forward passes
 * over rings indexed by absolute step (t mod size), so consecutive receding-
 * horizon windows share storage. With `warm`, the backward pass stops as soon
 * as a recomputed V_t equals the stored one bit for bit: every earlier V is
 * then what a cold pass would compute (same inputs, same operations), and a
 * stored forward decision is reused when its V_{t+1}, start energy and
 * upstream dual interval are the ones it was made with. Results are therefore
 * bit-identical to a cold solve.
 */
export class WindowSolver {
  readonly store: ValueStore;
  readonly plan: PlanRing;
  readonly stats: DpWorkStats = { backwardSteps: 0, backwardStepsReused: 0, forwardSteps: 0, forwardStepsReused: 0 };
  private readonly size: number;
  private readonly map: Int32Array;
  private readonly tOf: Int32Array;
  private readonly vid: Float64Array;
  private spare: number;
  private version = 0;
  /** Steps [chainFrom, chainTo] whose stored V_t = Bellman_t(stored V_{t+1}) (the last window's range). */
  private chainFrom = Infinity;
  private chainTo = -Infinity;
  /** V_t for t ≤ keptBelow were left as they were by the last backward pass. */
  private keptBelow = -Infinity;
  /** Steps [passFrom, passTo) of the last forward pass: their plan entries chain (inputs = previous outputs). */
  private passFrom = Infinity;
  private passTo = -Infinity;
  private readonly fs = newForwardStepResult();
  /** Steps whose plan entries the last forward pass recomputed (the rest it reused), in order. */
  readonly recomputed: Int32Array;
  recomputedCount = 0;

  constructor(
    private readonly ctx: DpContext,
    maxWindowSteps: number,
  ) {
    this.size = maxWindowSteps + 1;
    this.store = new ValueStore(this.size + 1);
    this.map = new Int32Array(this.size);
    for (let r = 0; r < this.size; r++) this.map[r] = r;
    this.spare = this.size;
    this.tOf = new Int32Array(this.size).fill(-1);
    this.vid = new Float64Array(this.size + 1);
    this.plan = new PlanRing(this.size);
    this.recomputed = new Int32Array(this.size);
  }

  /** Index of step t in the plan ring. */
  ringIndex(t: number): number {
    return t % this.size;
  }

  /** Physical store slot of V_t (valid for t of the last solved window). */
  slotOf(t: number): number {
    return this.map[t % this.size] ?? 0;
  }

  /**
   * Backward pass over [start, end] then forward pass over [start, forwardTo).
   * Returns null on success, else a message naming the first offending step.
   */
  solveWindow(start: number, end: number, e0: number, rule: TerminalRule, forwardTo: number, warm: boolean): string | null {
    const failure = this.backward(start, end, e0, rule, warm);
    if (failure !== null) {
      this.chainFrom = Infinity;
      this.chainTo = -Infinity;
      return failure;
    }
    this.chainFrom = start;
    this.chainTo = end;
    return this.forward(start, forwardTo, e0, warm) ? null : this.explain(start, end, e0, rule);
  }

  private explain(start: number, end: number, e0: number, rule: TerminalRule): string {
    return (
      diagnoseInfeasible(this.ctx, start, end, e0, rule) ??
      `numerical trouble between steps ${start} and ${end}: the exact dynamic program lost feasibility; use the LP path`
    );
  }

  private backward(start: number, end: number, e0: number, rule: TerminalRule, warm: boolean): string | null {
    const { ctx, store, map, tOf, size } = this;
    // Stopping at t is only sound when every V below t down to start belongs to one consistent chain.
    const canStop = warm && start >= this.chainFrom;
    this.keptBelow = -Infinity;
    for (let t = end; t >= start; t--) {
      const r = t % size;
      const out = this.spare;
      const ok =
        t === end
          ? writeTerminal(ctx, store, out, rule, e0)
          : backwardStep(store, out, map[(t + 1) % size] ?? 0, ctx.stages, t, ctx.retention, ctx.emin, ctx.emax, ctx.tol);
      if (!ok) return this.explain(start, end, e0, rule);
      this.stats.backwardSteps++;
      if (canStop && t <= this.chainTo && tOf[r] === t && store.sameShape(out, map[r] ?? 0)) {
        this.stats.backwardStepsReused += t - start;
        this.keptBelow = t;
        return null;
      }
      this.spare = map[r] ?? 0;
      map[r] = out;
      tOf[r] = t;
      this.vid[out] = ++this.version;
    }
    return null;
  }

  private forward(start: number, to: number, e0: number, warm: boolean): boolean {
    const { ctx, store, plan, fs, size, map, vid } = this;
    const a = ctx.retention;
    const net = ctx.stages.netLoadKw;
    const hiMark = ctx.emax - 1e-12 * ctx.emax;
    const loMark = ctx.emin + 1e-12 * ctx.emax;
    const { tTag, vidUsed, eIn, muInLo, muInHi, y, muLo: outLo, muHi: outHi } = plan;
    let e = e0;
    let muLo = -Infinity;
    let muHi = Infinity;
    let reused = 0;
    let r = start % size;
    const prevFrom = this.passFrom;
    const prevTo = this.passTo;
    this.passFrom = Infinity;
    this.passTo = -Infinity;
    let recomputed = 0;
    for (let t = start; t < to; t++) {
      const rNext = r + 1 === size ? 0 : r + 1;
      const w = map[rNext] ?? 0;
      const v = vid[w] ?? 0;
      if (t > start) {
        // Link the upstream dual interval through e_t: μ_{t−1} = a·μ_t inside the
        // window, one-sided at a bound (its multiplier takes the rest).
        muLo = e <= loMark ? -Infinity : a === 1 ? muLo : muLo / a;
        muHi = e >= hiMark ? Infinity : a === 1 ? muHi : muHi / a;
      }
      if (
        warm &&
        tTag[r] === t &&
        vidUsed[r] === v &&
        sameBits(eIn[r] ?? NaN, e) &&
        sameBits(muInLo[r] ?? NaN, muLo) &&
        sameBits(muInHi[r] ?? NaN, muHi)
      ) {
        reused++;
        // The last pass chained its entries, and every V_{t'+1} with t'+1 ≤ keptBelow is
        // the one it used: all of them match too, so jump to the last such step.
        const last = Math.min(this.keptBelow - 1, prevTo - 1, to - 1);
        if (t >= prevFrom && last > t) {
          reused += last - t;
          r = (r + last - t) % size;
          t = last;
        }
      } else {
        if (!forwardStep(store, w, ctx.stages, t, a * e, ctx.tol, fs)) return false;
        plan.record(r, t, v, e, muLo, muHi, fs, net[t] ?? 0);
        this.recomputed[recomputed++] = t;
      }
      e = y[r] ?? 0;
      muLo = outLo[r] ?? 0;
      muHi = outHi[r] ?? 0;
      r = r + 1 === size ? 0 : r + 1;
    }
    this.recomputedCount = recomputed;
    this.passFrom = start;
    this.passTo = to;
    this.stats.forwardStepsReused += reused;
    this.stats.forwardSteps += to - start - reused;
    return true;
  }
}
