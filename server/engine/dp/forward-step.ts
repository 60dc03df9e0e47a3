import type { StageTable } from './stage-cost';
import type { ValueStore } from './value-store';

/** The outcome of one forward step; reused between calls to avoid allocation. */
export interface ForwardStepResult {
  /** Chosen energy at the end of the step (kWh). */
  y: number;
  /** Chosen energy change (kWh) and the optimal charge/discharge (kW). */
  u: number;
  c: number;
  d: number;
  /** Slopes of V_{t+1} left and right of y (currency/kWh; ∓Infinity at its domain ends). */
  wLeft: number;
  wRight: number;
  /** Slopes of h_t left and right of u (currency/kWh; ∓Infinity at its domain ends). */
  hLeft: number;
  hRight: number;
}

export function newForwardStepResult(): ForwardStepResult {
  return { y: 0, u: 0, c: 0, d: 0, wLeft: 0, wRight: 0, hLeft: 0, hRight: 0 };
}

/**
 * Chooses e_{t+1} = y minimising V_{t+1}(y) + h_t(y − z), z = a·e_t, by walking
 * the breakpoints of both convex functions until the right slope of the sum
 * turns non-negative. When the minimum is flat, the point closest to z (least
 * throughput) wins. Returns false when no y is feasible.
 */
export function forwardStep(
  store: ValueStore,
  w: number,
  st: StageTable,
  t: number,
  z: number,
  tol: number,
  out: ForwardStepResult,
): boolean {
  const base = st.off[t] ?? 0;
  const points = (st.off[t + 1] ?? 0) - base;
  if (points === 0) return false;
  const kSeg = points - 1;
  const nW = store.count[w] ?? 0;
  const o = w * store.cap;
  const sl = store.slope;
  const su = st.u;
  const ss = st.slope;
  const wLo = store.lo[w] ?? 0;
  const wHi = store.hi[w] ?? 0;
  const yMin = z + (su[base] ?? 0);
  const yMax = z + (su[base + kSeg] ?? 0);
  const yL = wLo > yMin ? wLo : yMin;
  const yR = wHi < yMax ? wHi : yMax;
  let y = yL;
  if (yL > yR) {
    if (yL - yR > tol) return false;
    // Within rounding: keep the window/terminal bound exact, the power bound absorbs it.
    y = wLo > yMax ? wLo : wHi;
  }
  // Locate y: W segment j starting at pw, stage segment k.
  const len = store.len;
  let j = 0;
  let pw = wLo;
  while (j < nW) {
    const end = j === nW - 1 ? wHi : pw + (len[o + j] ?? 0);
    if (end > y) break;
    pw = end;
    j++;
  }
  let k = 0;
  while (k < kSeg && z + (su[base + k + 1] ?? 0) <= y) k++;
  if (yL <= yR) {
    // Walk right while the right slope g of the sum is negative; along a flat
    // minimum (g = 0) only while idling (y = z, least throughput) lies ahead.
    for (;;) {
      const g = (j < nW ? (sl[o + j] ?? 0) : Infinity) + (k < kSeg ? (ss[base + k] ?? 0) : Infinity);
      if (y >= yR || g > 0 || (g === 0 && y >= z)) break;
      const endW = j < nW ? (j === nW - 1 ? wHi : pw + (len[o + j] ?? 0)) : Infinity;
      const endS = k < kSeg ? z + (su[base + k + 1] ?? 0) : Infinity;
      let next = endW < endS ? endW : endS;
      if (next > yR) next = yR;
      if (g === 0 && next > z) {
        // z lies inside both current pieces, so the pointers stay valid.
        y = z;
        break;
      }
      y = next;
      if (endW <= next) {
        pw = endW;
        j++;
      }
      if (endS <= next) k++;
    }
  }
  // Slopes of V_{t+1} at y. A breakpoint within tol counts as y's own: W's
  // positions are sums of lengths while y may come from z + u, so one kink
  // can land an ulp apart on the two sides.
  let wl = j < nW ? (sl[o + j] ?? 0) : nW > 0 ? (sl[o + nW - 1] ?? 0) : -Infinity;
  let wr = j < nW ? wl : Infinity;
  if (y - pw <= tol) wl = j > 0 ? (sl[o + j - 1] ?? 0) : -Infinity;
  if (j < nW && (j === nW - 1 ? wHi : pw + (len[o + j] ?? 0)) - y <= tol) wr = j + 1 < nW ? (sl[o + j + 1] ?? 0) : Infinity;
  out.wLeft = wl;
  out.wRight = wr;
  // The stage side: at a stage point use its exact optimum, else interpolate.
  const atPoint = k === kSeg || y === z + (su[base + k] ?? 0) || y < yMin;
  if (atPoint) {
    const kk = y < yMin ? 0 : k;
    out.u = su[base + kk] ?? 0;
    out.c = st.c[base + kk] ?? 0;
    out.d = st.d[base + kk] ?? 0;
    out.hLeft = kk > 0 ? (ss[base + kk - 1] ?? 0) : -Infinity;
    out.hRight = kk < kSeg ? (ss[base + kk] ?? 0) : Infinity;
  } else {
    const u0 = su[base + k] ?? 0;
    const u1 = su[base + k + 1] ?? 0;
    const uu = y - z;
    let th = (uu - u0) / (u1 - u0);
    th = th < 0 ? 0 : th > 1 ? 1 : th;
    const c0 = st.c[base + k] ?? 0;
    const d0 = st.d[base + k] ?? 0;
    out.u = uu;
    out.c = c0 + th * ((st.c[base + k + 1] ?? 0) - c0);
    out.d = d0 + th * ((st.d[base + k + 1] ?? 0) - d0);
    out.hLeft = uu - u0 <= tol ? (k > 0 ? (ss[base + k - 1] ?? 0) : -Infinity) : (ss[base + k] ?? 0);
    out.hRight = u1 - uu <= tol ? (k + 1 < kSeg ? (ss[base + k + 1] ?? 0) : Infinity) : (ss[base + k] ?? 0);
  }
  out.y = y;
  return true;
}
