import type { ForwardStepResult } from './forward-step';

/**
 * Forward decisions per absolute step (index t mod size), with what each was
 * made from (version of V_{t+1}, start energy, upstream dual interval) so a
 * later window can reuse it only when it would recompute the same bits.
 *
 * Dual bookkeeping (all in currency/kWh, μ = value/1000): the LP's duals of
 * the SoC equations are exactly the μ that satisfy the KKT conditions along
 * the optimal path: μ_t ∈ ∂h_t(u_t), μ_{t−1} = a·μ_t where e_t is strictly
 * inside the window (one-sided at a bound), and μ_t ∈ −∂V_{t+1}(e_{t+1}).
 * muLo/muHi carry the upstream part (steps ≤ t); intersecting it with
 * −∂V_{t+1} gives every value some optimal LP dual takes, and we report its
 * midpoint (its finite end when one end is open).
 *
 * c, d, y and value are written twice (at r and r + size), so any window of up
 * to `size` steps is one contiguous run of them: open-loop plans are handed
 * out as views, without copying.
 */
export class PlanRing {
  readonly tTag: Int32Array;
  readonly vidUsed: Float64Array;
  readonly eIn: Float64Array;
  readonly muInLo: Float64Array;
  readonly muInHi: Float64Array;
  readonly y: Float64Array;
  readonly c: Float64Array;
  readonly d: Float64Array;
  readonly m: Float64Array;
  readonly x: Float64Array;
  readonly muLo: Float64Array;
  readonly muHi: Float64Array;
  /** Stored-energy value (currency/MWh) and the slope interval of V_{t+1} at y. */
  readonly value: Float64Array;
  readonly rangeLo: Float64Array;
  readonly rangeHi: Float64Array;

  constructor(size: number) {
    this.tTag = new Int32Array(size).fill(-1);
    this.vidUsed = new Float64Array(size);
    this.eIn = new Float64Array(size);
    this.muInLo = new Float64Array(size);
    this.muInHi = new Float64Array(size);
    this.y = new Float64Array(2 * size);
    this.c = new Float64Array(2 * size);
    this.d = new Float64Array(2 * size);
    this.m = new Float64Array(size);
    this.x = new Float64Array(size);
    this.muLo = new Float64Array(size);
    this.muHi = new Float64Array(size);
    this.value = new Float64Array(2 * size);
    this.rangeLo = new Float64Array(size);
    this.rangeHi = new Float64Array(size);
  }

  record(r: number, t: number, vid: number, e: number, muLo: number, muHi: number, fs: ForwardStepResult, netKw: number): void {
    this.tTag[r] = t;
    this.vidUsed[r] = vid;
    this.eIn[r] = e;
    this.muInLo[r] = muLo;
    this.muInHi[r] = muHi;
    const r2 = r + this.tTag.length;
    this.y[r] = fs.y;
    this.y[r2] = fs.y;
    this.c[r] = fs.c;
    this.c[r2] = fs.c;
    this.d[r] = fs.d;
    this.d[r2] = fs.d;
    const q = netKw + fs.c - fs.d;
    this.m[r] = q > 0 ? q : 0;
    this.x[r] = q < 0 ? -q : 0;
    const uLo = muLo > fs.hLeft ? muLo : fs.hLeft;
    const uHi = muHi < fs.hRight ? muHi : fs.hRight;
    this.muLo[r] = uLo;
    this.muHi[r] = uHi;
    const dLo = -fs.wRight;
    const dHi = -fs.wLeft;
    this.rangeLo[r] = dLo * 1000;
    this.rangeHi[r] = dHi * 1000;
    const iLo = uLo > dLo ? uLo : dLo;
    const iHi = uHi < dHi ? uHi : dHi;
    let mu: number;
    if (iLo > iHi) {
      const mid = (iLo + iHi) / 2;
      mu = mid < dLo ? dLo : mid > dHi ? dHi : mid;
    } else if (iLo > -Infinity && iHi < Infinity) mu = (iLo + iHi) / 2;
    else if (iLo > -Infinity) mu = iLo;
    else if (iHi < Infinity) mu = iHi;
    else mu = 0;
    this.value[r] = mu * 1000;
    this.value[r2] = mu * 1000;
  }
}
