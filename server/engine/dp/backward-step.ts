import type { StageTable } from './stage-cost';
import type { ValueStore } from './value-store';

/**
 * One Bellman step: V_t(e) = min_u h_t(u) + V_{t+1}(a·e + u), restricted to the
 * SoC window [emin, emax] (kWh), with a = 1 − σΔt the self-discharge retention.
 *
 * With F = V_{t+1} □ ȟ (infimal convolution, ȟ(w) = h_t(−w)) we have
 * V_t(e) = F(a·e). For convex piecewise-linear functions the infimal
 * convolution starts at the sum of the left ends and takes the segments of
 * both in ascending slope order, so the step is one merge of two sorted
 * lists, then a change of variable (lengths / a, slopes · a) and a clip.
 *
 * Writes slot `out` from slot `inp` (which must differ). Returns false when
 * the result is empty: no energy at step t can satisfy the later constraints.
 */
export function backwardStep(
  store: ValueStore,
  out: number,
  inp: number,
  st: StageTable,
  t: number,
  a: number,
  emin: number,
  emax: number,
  tol: number,
): boolean {
  const base = st.off[t] ?? 0;
  const points = (st.off[t + 1] ?? 0) - base;
  if (points === 0) return false;
  const kSeg = points - 1;
  const nW = store.count[inp] ?? 0;
  store.ensureCapacity(nW + kSeg);
  const len = store.len;
  const sl = store.slope;
  const cap = store.cap;
  const oW = inp * cap;
  const oO = out * cap;
  const su = st.u;
  const ss = st.slope;
  const inv = 1 / a;
  let p = ((store.lo[inp] ?? 0) - (su[base + kSeg] ?? 0)) * inv;
  const hiF = ((store.hi[inp] ?? 0) - (su[base] ?? 0)) * inv;
  let v = (store.vlo[inp] ?? 0) + (st.h[base + kSeg] ?? 0);
  if (p > emax + tol || hiF < emin - tol) return false;
  const loOut = p > emin ? p : emin;
  const hiOut = hiF < emax ? hiF : emax;
  if (loOut >= hiOut) {
    // A single point (possibly after rounding at a bound).
    const at = loOut > hiOut ? (p > emax ? emax : emin) : loOut;
    store.lo[out] = at;
    store.hi[out] = at;
    store.vlo[out] = v;
    store.count[out] = 0;
    return true;
  }
  let i = 0;
  let k = kSeg - 1;
  let n = 0;
  let vAtLo = v;
  let started = p >= emin;
  while (i < nW || k >= 0) {
    let segLen: number;
    let segSlope: number;
    const wSlope = i < nW ? (sl[oW + i] ?? 0) : Infinity;
    const hSlope = k >= 0 ? -(ss[base + k] ?? 0) : Infinity;
    if (wSlope <= hSlope) {
      segLen = (len[oW + i] ?? 0) * inv;
      segSlope = wSlope * a;
      i++;
    } else {
      segLen = ((su[base + k + 1] ?? 0) - (su[base + k] ?? 0)) * inv;
      segSlope = hSlope * a;
      k--;
    }
    if (!started) {
      const skip = emin - p;
      if (segLen <= skip) {
        p += segLen;
        v += segSlope * segLen;
        continue;
      }
      v += segSlope * skip;
      segLen -= skip;
      p = emin;
      started = true;
      vAtLo = v;
    }
    if (p >= emax) break;
    if (p + segLen > emax) segLen = emax - p;
    if (segLen <= 0) continue;
    if (n > 0 && sl[oO + n - 1] === segSlope) {
      len[oO + n - 1] = (len[oO + n - 1] ?? 0) + segLen;
    } else {
      len[oO + n] = segLen;
      sl[oO + n] = segSlope;
      n++;
    }
    p += segLen;
  }
  store.lo[out] = loOut;
  store.hi[out] = hiOut;
  store.vlo[out] = vAtLo;
  store.count[out] = n;
  return true;
}
