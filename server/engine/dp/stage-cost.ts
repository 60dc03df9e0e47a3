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
  const dt = problem.stepHours;
  const off = new Int32Array(n + 1);
  const cap = n * MAX_POINTS;
  const u = new Float64Array(cap);
  const h = new Float64Array(cap);
  const c = new Float64Array(cap);
  const d = new Float64Array(cap);
  const slope = new Float64Array(cap);
  const netLoadKw = new Float64Array(n);
  const ctx = makeStepContext(b.powerChargeKw, b.powerDischargeKw, b.efficiencyCharge, b.efficiencyDischarge, dt, b.degradationCostPerMwh / 1000);
  const importLimit = problem.site.importLimitKw ?? Infinity;
  const exportLimit = problem.site.exportLimitKw ?? Infinity;
  let at = 0;
  for (let t = 0; t < n; t++) {
    off[t] = at;
    const net = (problem.loadKw[t] ?? 0) - (problem.generationKw[t] ?? 0);
    netLoadKw[t] = net;
    ctx.net = net;
    ctx.pImp = (problem.priceImport[t] ?? NaN) / 1000;
    ctx.pExp = (problem.priceExport[t] ?? NaN) / 1000;
    ctx.pLo = -exportLimit - net;
    ctx.pHi = importLimit - net;
    at += stepPoints(ctx, u, h, c, d, slope, at);
  }
  off[n] = at;
  return { steps: n, off, u, h, c, d, slope, netLoadKw };
}

interface StepContext {
  readonly pc: number;
  readonly pd: number;
  readonly etaC: number;
  readonly etaD: number;
  readonly dt: number;
  readonly deg: number;
  /** κ = 1/(η_ch·η_dis) − 1: extra site power per kW of simultaneous discharge at fixed u. */
  readonly kappa: number;
  net: number;
  pImp: number;
  pExp: number;
  /** Bounds on c − d from the grid limits (kW). */
  pLo: number;
  pHi: number;
  readonly candC: Float64Array;
  readonly candD: Float64Array;
  readonly candU: Float64Array;
  readonly order: Int32Array;
}

function makeStepContext(pc: number, pd: number, etaC: number, etaD: number, dt: number, deg: number): StepContext {
  return {
    pc, pd, etaC, etaD, dt, deg,
    kappa: 1 / (etaC * etaD) - 1,
    net: 0, pImp: 0, pExp: 0, pLo: -Infinity, pHi: Infinity,
    candC: new Float64Array(MAX_POINTS),
    candD: new Float64Array(MAX_POINTS),
    candU: new Float64Array(MAX_POINTS),
    order: new Int32Array(MAX_POINTS),
  };
}

/** Money paid in the step (currency) for charge c and discharge d (kW). */
function moneyAt(x: StepContext, c: number, d: number): number {
  const q = x.net + c - d;
  return x.dt * ((q > 0 ? x.pImp : x.pExp) * q + x.deg * d);
}

/** Writes the points of one step at `at`; returns how many. */
function stepPoints(
  x: StepContext, u: Float64Array, h: Float64Array, c: Float64Array, d: Float64Array, slope: Float64Array, at: number,
): number {
  // Fast path: grid limits never bind and burning energy through simultaneous
  // charge and discharge never pays (κ·p_exp + c_deg ≥ 0, the cheapest site
  // price times the extra site power it causes, plus wear): the optimum lies
  // on the no-waste path c·d = 0, whose kinks are the power limits and q = 0.
  const limitsSlack = -x.pd >= x.pLo && x.pc <= x.pHi;
  const noWaste = x.kappa > 0 ? x.kappa * Math.min(x.pExp, x.pImp) + x.deg >= 0 : x.deg >= 0;
  let count: number;
  if (limitsSlack && noWaste) count = noWastePoints(x);
  else count = vertexPoints(x);
  if (count === 0) return 0;
  // Evaluate, drop near-duplicates and collinear middles (keeps slopes strictly increasing).
  let m = 0;
  const uScale = x.dt * (x.pc * x.etaC + x.pd / x.etaD) + 1e-300;
  for (let i = 0; i < count; i++) {
    const k = x.order[i] ?? 0;
    const uk = x.candU[k] ?? 0;
    if (m > 0 && uk - (u[at + m - 1] ?? 0) <= 1e-13 * uScale) continue;
    let ck = x.candC[k] ?? 0;
    let dk = x.candD[k] ?? 0;
    if (!limitsSlack || !noWaste) {
      const best = bestSplit(x, uk);
      if (best < 0) continue;
      ck = bestC;
      dk = bestD;
    }
    u[at + m] = uk;
    c[at + m] = ck;
    d[at + m] = dk;
    h[at + m] = moneyAt(x, ck, dk);
    m++;
    // Remove the middle of three collinear points.
    while (m >= 3) {
      const i0 = at + m - 3, i1 = at + m - 2, i2 = at + m - 1;
      const s01 = ((h[i1] ?? 0) - (h[i0] ?? 0)) / ((u[i1] ?? 0) - (u[i0] ?? 0));
      const s12 = ((h[i2] ?? 0) - (h[i1] ?? 0)) / ((u[i2] ?? 0) - (u[i1] ?? 0));
      if (s12 - s01 > 1e-12 * (Math.abs(s01) + Math.abs(s12) + 1e-9)) break;
      u[i1] = u[i2] ?? 0; h[i1] = h[i2] ?? 0; c[i1] = c[i2] ?? 0; d[i1] = d[i2] ?? 0;
      m--;
    }
  }
  for (let k = 0; k + 1 < m; k++) {
    slope[at + k] = ((h[at + k + 1] ?? 0) - (h[at + k] ?? 0)) / ((u[at + k + 1] ?? 0) - (u[at + k] ?? 0));
  }
  return m;
}

function pushCandidate(x: StepContext, i: number, cc: number, dd: number): number {
  x.candC[i] = cc;
  x.candD[i] = dd;
  x.candU[i] = x.dt * (x.etaC * cc - dd / x.etaD);
  return i + 1;
}

/** Points of the no-waste path: full discharge, the q = 0 kink, idle, the kink while charging, full charge. */
function noWastePoints(x: StepContext): number {
  let i = 0;
  i = pushCandidate(x, i, 0, x.pd);
  if (x.net > 0 && x.net < x.pd) i = pushCandidate(x, i, 0, x.net);
  i = pushCandidate(x, i, 0, 0);
  if (-x.net > 0 && -x.net < x.pc) i = pushCandidate(x, i, -x.net, 0);
  i = pushCandidate(x, i, x.pc, 0);
  for (let k = 0; k < i; k++) x.order[k] = k;
  return i;
}

/**
 * All vertices of the box [0,P_ch]×[0,P_dis] cut by the grid-limit strip and
 * the q = 0 line: the value function of a parametric LP breaks only at
 * projections of such vertices, so these u values contain every kink of h.
 */
function vertexPoints(x: StepContext): number {
  const tolP = 1e-12 * (x.pc + x.pd + Math.abs(x.net) + 1);
  let i = 0;
  const consider = (cc: number, dd: number): void => {
    if (cc < -tolP || cc > x.pc + tolP || dd < -tolP || dd > x.pd + tolP) return;
    const p = cc - dd;
    if (p < x.pLo - tolP || p > x.pHi + tolP) return;
    i = pushCandidate(x, i, Math.min(Math.max(cc, 0), x.pc), Math.min(Math.max(dd, 0), x.pd));
  };
  consider(0, 0);
  consider(x.pc, 0);
  consider(0, x.pd);
  consider(x.pc, x.pd);
  const lines = [-x.net, x.pLo, x.pHi];
  for (const r of lines) {
    if (!Number.isFinite(r)) continue;
    consider(0, -r);
    consider(x.pc, x.pc - r);
    consider(r, 0);
    consider(r + x.pd, x.pd);
  }
  for (let k = 0; k < i; k++) x.order[k] = k;
  // Insertion sort by u: at most 16 entries.
  for (let k = 1; k < i; k++) {
    const v = x.order[k] ?? 0;
    const uv = x.candU[v] ?? 0;
    let j = k - 1;
    while (j >= 0 && (x.candU[x.order[j] ?? 0] ?? 0) > uv) {
      x.order[j + 1] = x.order[j] ?? 0;
      j--;
    }
    x.order[j + 1] = v;
  }
  return i;
}

let bestC = 0;
let bestD = 0;

/**
 * Cheapest (c, d) with energy change u: on the line c = (u/Δt + d/η_dis)/η_ch the
 * money is convex piecewise linear in d with one kink (q = 0), so the minimum
 * is at an end of the feasible d-interval or at the kink. Ties prefer less
 * discharge (less throughput). Sets bestC/bestD; returns -1 when infeasible.
 */
function bestSplit(x: StepContext, uk: number): number {
  const w = uk / x.dt; // kW of net stored power
  const base = w / x.etaC; // c − d when d = 0
  let lo = Math.max(0, -w * x.etaD);
  let hi = Math.min(x.pd, (x.pc * x.etaC - w) * x.etaD);
  if (x.kappa > 0) {
    lo = Math.max(lo, (x.pLo - base) / x.kappa);
    hi = Math.min(hi, (x.pHi - base) / x.kappa);
  }
  const tol = 1e-9 * (x.pc + x.pd + 1);
  if (lo > hi) {
    if (lo - hi > tol) return -1;
    lo = hi = (lo + hi) / 2;
  }
  const cOf = (dd: number): number => Math.min(Math.max((w + dd / x.etaD) / x.etaC, 0), x.pc);
  let bd = lo;
  let bm = moneyAt(x, cOf(lo), lo);
  const tryD = (dd: number): void => {
    const m = moneyAt(x, cOf(dd), dd);
    if (m < bm) { bm = m; bd = dd; }
  };
  if (x.kappa > 0) {
    const kink = (-x.net - base) / x.kappa;
    if (kink > lo && kink < hi) tryD(kink);
  }
  if (hi > lo) tryD(hi);
  bestD = bd;
  bestC = cOf(bd);
  return 0;
}
