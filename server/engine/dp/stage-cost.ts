import type { DispatchProblem } from '../types';

/**
 * The stage cost of every step as a convex piecewise-linear function of the
 * energy change u = η_ch·c·Δt − d·Δt/η_dis (kWh): h_t(u) is the cheapest money
 * paid in step t for that change, minimised over charge, discharge, import and
 * export (the same small LP the full model solves per step, so simultaneous
 * charge and discharge at negative prices is included).
 *
 * Storage is flat typed arrays: step t owns the points off[t] .. off[t+1]-1,
 * with u ascending, h the cost at u (currency), c/d the optimal charge and
 * discharge there (kW) and slope[k] the slope of the piece from point k to
 * k+1 (currency/kWh). Between two points the optimum is the linear
 * interpolation of the two end points (h is linear there, the feasible set
 * convex). A step with no feasible point has off[t] === off[t+1].
 */
export interface StageTable {
  readonly steps: number;
  readonly off: Int32Array;
  readonly u: Float64Array;
  readonly h: Float64Array;
  readonly c: Float64Array;
  readonly d: Float64Array;
  readonly slope: Float64Array;
  /** Net site load L − G per step (kW), kept for the grid flows. */
  readonly netLoadKw: Float64Array;
}

const MAX_POINTS = 16;

/** Builds the stage table for every step of the problem (prices per kWh inside). */
export function buildStageTable(problem: DispatchProblem): StageTable {
  const n = problem.priceImport.length;
  const b = problem.battery;
  const x = new StageBuilder(
    n,
    b.powerChargeKw,
    b.powerDischargeKw,
    b.efficiencyCharge,
    b.efficiencyDischarge,
    problem.stepHours,
    b.degradationCostPerMwh / 1000,
  );
  const importLimit = problem.site.importLimitKw ?? Infinity;
  const exportLimit = problem.site.exportLimitKw ?? Infinity;
  const { off, netLoadKw } = x;
  const available = problem.availability;
  for (let t = 0; t < n; t++) {
    off[t] = x.at;
    // Availability derates both power ratings for the step (DESIGN section 3.3); tolerances keep the ratings.
    if (available) x.setPowers(b.powerChargeKw * available[t]!, b.powerDischargeKw * available[t]!);
    const net = (problem.loadKw[t] ?? 0) - (problem.generationKw[t] ?? 0);
    netLoadKw[t] = net;
    x.net = net;
    x.pImp = (problem.priceImport[t] ?? NaN) / 1000;
    x.pExp = (problem.priceExport[t] ?? NaN) / 1000;
    x.pLo = -exportLimit - net;
    x.pHi = importLimit - net;
    x.step();
  }
  off[n] = x.at;
  const used = x.at;
  return {
    steps: n,
    off,
    u: x.u.subarray(0, used),
    h: x.h.subarray(0, used),
    c: x.c.subarray(0, used),
    d: x.d.subarray(0, used),
    slope: x.slope.subarray(0, used),
    netLoadKw,
  };
}

/** Builds the points step by step into preallocated typed arrays (no allocation per step). */
class StageBuilder {
  readonly off: Int32Array;
  u: Float64Array;
  h: Float64Array;
  c: Float64Array;
  d: Float64Array;
  slope: Float64Array;
  readonly netLoadKw: Float64Array;
  /** κ = 1/(η_ch·η_dis) − 1: extra site power per kW of simultaneous discharge at fixed u. */
  private readonly kappa: number;
  private readonly uScale: number;
  private readonly tolP: number;
  private readonly candC = new Float64Array(MAX_POINTS);
  private readonly candD = new Float64Array(MAX_POINTS);
  private readonly candU = new Float64Array(MAX_POINTS);
  private readonly order = new Int32Array(MAX_POINTS);
  private nCand = 0;
  at = 0;
  /** Points of the current step so far. */
  private m = 0;
  net = 0;
  pImp = 0;
  pExp = 0;
  /** Bounds on c − d from the grid limits (kW). */
  pLo = -Infinity;
  pHi = Infinity;
  private bestC = 0;
  private bestD = 0;

  constructor(
    n: number,
    private pc: number,
    private pd: number,
    private readonly etaC: number,
    private readonly etaD: number,
    private readonly dt: number,
    private readonly deg: number,
  ) {
    this.off = new Int32Array(n + 1);
    // Most steps have at most five points (the no-waste path); grow when not.
    const cap = n * 5 + MAX_POINTS;
    this.u = new Float64Array(cap);
    this.h = new Float64Array(cap);
    this.c = new Float64Array(cap);
    this.d = new Float64Array(cap);
    this.slope = new Float64Array(cap);
    this.netLoadKw = new Float64Array(n);
    this.kappa = 1 / (etaC * etaD) - 1;
    this.uScale = dt * (pc * etaC + pd / etaD) + 1e-300;
    this.tolP = 1e-12 * (pc + pd + 1);
  }

  /** Power limits of the next step (kW), e.g. derated by availability. */
  setPowers(pc: number, pd: number): void {
    this.pc = pc;
    this.pd = pd;
  }

  /** Money paid in the step (currency) for charge c and discharge d (kW). */
  private money(c: number, d: number): number {
    const q = this.net + c - d;
    return this.dt * ((q > 0 ? this.pImp : this.pExp) * q + this.deg * d);
  }

  private grow(): void {
    const cap = this.u.length * 2;
    const more = (a: Float64Array): Float64Array => {
      const b = new Float64Array(cap);
      b.set(a);
      return b;
    };
    this.u = more(this.u);
    this.h = more(this.h);
    this.c = more(this.c);
    this.d = more(this.d);
    this.slope = more(this.slope);
  }

  step(): void {
    this.m = 0;
    if (this.at + MAX_POINTS > this.u.length) this.grow();
    // Fast path: grid limits never bind and burning energy through simultaneous
    // charge and discharge never pays (κ·p_exp + c_deg ≥ 0: the cheapest site
    // price times the extra site power it causes, plus wear), so the optimum
    // lies on the no-waste path c·d = 0, whose kinks are the power limits and
    // the import/export switch q = 0.
    const limitsSlack = -this.pd >= this.pLo && this.pc <= this.pHi;
    const minPrice = this.pExp < this.pImp ? this.pExp : this.pImp;
    const noWaste = this.kappa > 0 ? this.kappa * minPrice + this.deg >= 0 : this.deg >= 0;
    if (limitsSlack && noWaste) {
      const net = this.net;
      this.add(0, this.pd);
      if (net > 0 && net < this.pd) this.add(0, net);
      this.add(0, 0);
      if (-net > 0 && -net < this.pc) this.add(-net, 0);
      this.add(this.pc, 0);
    } else {
      this.vertexCandidates();
      for (let i = 0; i < this.nCand; i++) {
        const k = this.order[i] ?? 0;
        if (this.bestSplit(this.candU[k] ?? 0)) this.add(this.bestC, this.bestD);
      }
    }
    const at = this.at;
    for (let k = 0; k + 1 < this.m; k++) {
      const sk = ((this.h[at + k + 1] ?? 0) - (this.h[at + k] ?? 0)) / ((this.u[at + k + 1] ?? 0) - (this.u[at + k] ?? 0));
      // Kept collinear points may leave a rounding-level descent: keep slopes sorted.
      this.slope[at + k] = k > 0 && sk < (this.slope[at + k - 1] ?? 0) ? (this.slope[at + k - 1] ?? 0) : sk;
    }
    this.at += this.m;
  }

  /**
   * Appends the point (c, d) of ascending u; drops near-duplicates and the
   * middle of three collinear points when its flows are the interpolation of
   * its neighbours' (h is convex, so such a point adds nothing).
   */
  private add(cc: number, dd: number): void {
    const { u, h, c, d } = this;
    const uk = this.dt * (this.etaC * cc - dd / this.etaD);
    const i = this.at + this.m;
    if (this.m > 0 && uk - (u[i - 1] ?? 0) <= 1e-13 * this.uScale) return;
    u[i] = uk;
    c[i] = cc;
    d[i] = dd;
    h[i] = this.money(cc, dd);
    this.m++;
    while (this.m >= 3) {
      const i2 = this.at + this.m - 1;
      const i1 = i2 - 1;
      const i0 = i2 - 2;
      const s01 = ((h[i1] ?? 0) - (h[i0] ?? 0)) / ((u[i1] ?? 0) - (u[i0] ?? 0));
      const s12 = ((h[i2] ?? 0) - (h[i1] ?? 0)) / ((u[i2] ?? 0) - (u[i1] ?? 0));
      if (s12 - s01 > 1e-12 * (Math.abs(s01) + Math.abs(s12) + 1e-9)) break;
      // Keep a middle point whose flows the neighbours would not interpolate (idling
      // between discharge and charge at equal slopes): it is the least-throughput optimum.
      const th = ((u[i1] ?? 0) - (u[i0] ?? 0)) / ((u[i2] ?? 0) - (u[i0] ?? 0));
      const cMid = (c[i0] ?? 0) + th * ((c[i2] ?? 0) - (c[i0] ?? 0));
      const dMid = (d[i0] ?? 0) + th * ((d[i2] ?? 0) - (d[i0] ?? 0));
      if (Math.abs(cMid - (c[i1] ?? 0)) > this.tolP * 1e3 || Math.abs(dMid - (d[i1] ?? 0)) > this.tolP * 1e3) break;
      u[i1] = u[i2] ?? 0;
      h[i1] = h[i2] ?? 0;
      c[i1] = c[i2] ?? 0;
      d[i1] = d[i2] ?? 0;
      this.m--;
    }
  }

  private consider(cc: number, dd: number): void {
    const tol = this.tolP;
    if (cc < -tol || cc > this.pc + tol || dd < -tol || dd > this.pd + tol) return;
    const p = cc - dd;
    if (p < this.pLo - tol || p > this.pHi + tol) return;
    const i = this.nCand++;
    const c1 = cc < 0 ? 0 : cc > this.pc ? this.pc : cc;
    const d1 = dd < 0 ? 0 : dd > this.pd ? this.pd : dd;
    this.candC[i] = c1;
    this.candD[i] = d1;
    this.candU[i] = this.dt * (this.etaC * c1 - d1 / this.etaD);
  }

  private considerLine(r: number): void {
    if (!Number.isFinite(r)) return;
    this.consider(0, -r);
    this.consider(this.pc, this.pc - r);
    this.consider(r, 0);
    this.consider(r + this.pd, this.pd);
  }

  /**
   * All vertices of the box [0,P_ch]×[0,P_dis] cut by the grid-limit strip and
   * the q = 0 line, sorted by u: the value function of a parametric LP breaks
   * only at projections of such vertices, so these contain every kink of h.
   */
  private vertexCandidates(): void {
    this.nCand = 0;
    this.consider(0, 0);
    this.consider(this.pc, 0);
    this.consider(0, this.pd);
    this.consider(this.pc, this.pd);
    this.considerLine(-this.net);
    this.considerLine(this.pLo);
    this.considerLine(this.pHi);
    const { order, candU } = this;
    for (let k = 0; k < this.nCand; k++) order[k] = k;
    for (let k = 1; k < this.nCand; k++) {
      const v = order[k] ?? 0;
      const uv = candU[v] ?? 0;
      let j = k - 1;
      while (j >= 0 && (candU[order[j] ?? 0] ?? 0) > uv) {
        order[j + 1] = order[j] ?? 0;
        j--;
      }
      order[j + 1] = v;
    }
  }

  private cOf(w: number, dd: number): number {
    const cc = (w + dd / this.etaD) / this.etaC;
    return cc < 0 ? 0 : cc > this.pc ? this.pc : cc;
  }

  /**
   * Cheapest (c, d) with energy change uk: on the line c = (u/Δt + d/η_dis)/η_ch
   * the money is convex piecewise linear in d with one kink (q = 0), so the
   * minimum is at an end of the feasible d-interval or at the kink. Ties
   * prefer less discharge (less throughput). Sets bestC/bestD; false when infeasible.
   */
  private bestSplit(uk: number): boolean {
    const w = uk / this.dt;
    const base = w / this.etaC;
    let lo = Math.max(0, -w * this.etaD);
    let hi = Math.min(this.pd, (this.pc * this.etaC - w) * this.etaD);
    if (this.kappa > 0) {
      lo = Math.max(lo, (this.pLo - base) / this.kappa);
      hi = Math.min(hi, (this.pHi - base) / this.kappa);
    }
    if (lo > hi) {
      if (lo - hi > 1e-9 * (this.pc + this.pd + 1)) return false;
      lo = hi = (lo + hi) / 2;
    }
    let bd = lo;
    let bm = this.money(this.cOf(w, lo), lo);
    if (this.kappa > 0) {
      const kink = (-this.net - base) / this.kappa;
      if (kink > lo && kink < hi) {
        const mk = this.money(this.cOf(w, kink), kink);
        if (mk < bm) {
          bm = mk;
          bd = kink;
        }
      }
    }
    if (hi > lo && this.money(this.cOf(w, hi), hi) < bm) bd = hi;
    this.bestD = bd;
    this.bestC = this.cOf(w, bd);
    return true;
  }
}
