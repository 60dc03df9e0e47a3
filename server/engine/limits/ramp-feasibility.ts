/**
 * Whether some net power p_t = d_t − c_t meets every per-interval power limit
 * (derated ratings, grid limits against the site's net load) and the ramp rate
 * between intervals, ignoring energy: a forward pass over reachable intervals
 * [lo_t, hi_t]. An empty one names the interval and the limit at fault before
 * the solver could only say "infeasible".
 *
 * Per interval: −a·P_ch ≤ p ≤ a·P_dis, and from m − x = N − p (N = load − generation)
 * with 0 ≤ m ≤ M, 0 ≤ x ≤ X: N − M ≤ p ≤ N + X.
 */
import type { DispatchProblem } from '../types';
import type { InputIssue } from '../model/validate-battery';

const kw = (v: number) => `${+v.toFixed(3)} kW`;

function allowedRange(p: DispatchProblem, t: number): [number, number] {
  const a = p.availability?.[t] ?? 1;
  const net = p.loadKw[t]! - p.generationKw[t]!;
  const { importLimitKw: M, exportLimitKw: X } = p.site;
  const lo = Math.max(-a * p.battery.powerChargeKw, M === null ? -Infinity : net - M);
  const hi = Math.min(a * p.battery.powerDischargeKw, X === null ? Infinity : net + X);
  return [lo, hi];
}

function stepIssue(p: DispatchProblem, t: number, label: (t: number) => string): InputIssue {
  const a = p.availability?.[t] ?? 1;
  const net = p.loadKw[t]! - p.generationKw[t]!;
  const rated = `availability ${a} of ${kw(p.battery.powerDischargeKw)} discharge and ${kw(p.battery.powerChargeKw)} charge`;
  return {
    field: 'availability',
    step: t,
    message: `at ${label(t)} the site's load minus generation (${kw(net)}) cannot be met within the grid limits with the battery's available power (${rated}): no schedule can serve it; check the availability profile, the load profile or the site's grid limits`,
  };
}

/** The first interval no net power can reach under the ramp rate and the per-interval limits, or null. */
export function rampWindowIssue(p: DispatchProblem, label: (t: number) => string): InputIssue | null {
  const rate = p.battery.rampKwPerMin ?? null;
  const step = rate === null ? Infinity : rate * 60 * p.stepHours;
  const tol = 1e-9 * Math.max(1, p.battery.powerChargeKw, p.battery.powerDischargeKw);
  let lo = -Infinity;
  let hi = Infinity;
  const given = p.initialNetPowerKw;
  if (given !== undefined) [lo, hi] = [given, given];
  for (let t = 0; t < p.priceImport.length; t++) {
    const [alo, ahi] = allowedRange(p, t);
    if (alo > ahi + tol) return stepIssue(p, t, label);
    const [rlo, rhi] = [lo - step, hi + step];
    lo = Math.max(alo, rlo);
    hi = Math.min(ahi, rhi);
    if (lo <= hi + tol) continue;
    const from =
      t === 0
        ? `the given initial net power ${kw(given!)}`
        : `what ${label(t - 1)} can reach (${kw(rlo + step)} to ${kw(rhi - step)})`;
    return {
      field: 'battery.rampKwPerMin',
      step: t,
      message: `the ramp rate ${rate} kW/min lets the net power change by at most ${kw(step)} per interval, so from ${from} it must stay within ${kw(rlo)} to ${kw(rhi)} at ${label(t)}, ${t === 0 ? 'the first interval, ' : ''}but that interval allows only ${kw(alo)} to ${kw(ahi)} (availability and grid limits): no schedule can keep to it; raise the ramp rate${t === 0 ? ', give another initial power' : ''} or check the availability`,
    };
  }
  return null;
}
