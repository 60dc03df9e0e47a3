/**
 * Near-steady share and leaving arc (as `arcFigures`) of the consecutive
 * open-loop plans of one closed-loop run, updated only where a plan changed.
 * Windows slide forward and consecutive plans share most of their steps, so
 * recounting every window costs steps × horizon over a run (about 6 million
 * distances for a year of hourly re-plans over six horizons and two rules);
 * keeping the in-band flag per step costs the changed steps plus the leaving
 * arc's length per window. The figures are the same numbers bit for bit: the
 * same per-step test, integer counts, the same division.
 */
import { DEFAULT_BAND_FRACTION } from './turnpike-figures';

export interface SlidingFigures {
  nearSteadyShare: number;
  leavingArcSteps: number;
}

export class SlidingArcFigures {
  /** 1 when the current plan's step t lies within the band, by absolute step. */
  private readonly inside: Uint8Array;
  private from = 0;
  private to = 0;
  private count = 0;
  private readonly out: SlidingFigures = { nearSteadyShare: 0, leavingArcSteps: 0 };

  /** `reference[t]`: reference SoC at the end of absolute step t (NaN counts as inside). */
  constructor(
    private readonly reference: ArrayLike<number>,
    private readonly scale: number,
    private readonly bandFraction = DEFAULT_BAND_FRACTION,
  ) {
    this.inside = new Uint8Array(reference.length);
  }

  private flag(t: number, soc: number): number {
    const ref = this.reference[t]!;
    const dist = Number.isNaN(ref) ? 0 : Math.abs(soc - ref) / this.scale;
    return dist <= this.bandFraction + 1e-12 ? 1 : 0;
  }

  /**
   * Figures of the plan over absolute steps [start, end) with `soc[k]` the SoC
   * at the end of step start + k. `changed` lists the steps whose SoC may differ
   * from the previous plan's; every other step must have been in it, unchanged.
   * A window that does not slide forward is recounted in full. The returned
   * object is reused by the next call.
   */
  update(start: number, end: number, soc: ArrayLike<number>, changed: ArrayLike<number>): Readonly<SlidingFigures> {
    const { inside } = this;
    if (start < this.from || end < this.to || start > this.to) {
      this.from = this.to = start;
      this.count = 0;
    }
    for (let t = this.from; t < start; t++) this.count -= inside[t]!;
    for (let i = 0; i < changed.length; i++) {
      const t = changed[i]!;
      if (t < start || t >= this.to) continue; // new steps are counted below
      const f = this.flag(t, soc[t - start]!);
      this.count += f - inside[t]!;
      inside[t] = f;
    }
    for (let t = this.to; t < end; t++) {
      const f = this.flag(t, soc[t - start]!);
      inside[t] = f;
      this.count += f;
    }
    this.from = start;
    this.to = end;
    let last = end - 1;
    while (last >= start && inside[last] === 0) last--;
    const n = end - start;
    this.out.nearSteadyShare = n === 0 ? 0 : this.count / n;
    this.out.leavingArcSteps = last < start ? 0 : end - 1 - last;
    return this.out;
  }
}
