import type { TerminalRule } from '../types';
import type { DpContext } from './context';

const fmt = (x: number): string => (Math.round(x * 1000) / 1000).toString();

function stepLabel(ctx: DpContext, t: number): string {
  const ms = ctx.problem.timesMs[t];
  return `step ${t}${ms === undefined ? '' : ` (${new Date(ms).toISOString()})`}`;
}

/**
 * Explains why the window [from, to) starting at e0 has no feasible schedule,
 * naming the first offending step: a grid balance that no charge/discharge
 * can meet, an SoC window the battery cannot stay in, or a terminal rule it
 * cannot reach. Uses the exact reachable energy interval, step by step.
 * Returns null when the window is feasible.
 */
export function diagnoseInfeasible(ctx: DpContext, from: number, to: number, e0: number, rule: TerminalRule): string | null {
  const { stages: st, emin, emax, tol, retention: a } = ctx;
  const b = ctx.problem.battery;
  const site = ctx.problem.site;
  let lo = e0;
  let hi = e0;
  for (let t = from; t < to; t++) {
    const base = st.off[t] ?? 0;
    const end = (st.off[t + 1] ?? 0) - 1;
    if (end < base) {
      const net = st.netLoadKw[t] ?? 0;
      const imp = site.importLimitKw ?? Infinity;
      return net - b.powerDischargeKw > imp
        ? `${stepLabel(ctx, t)}: net site load ${fmt(net)} kW exceeds the import limit ${fmt(imp)} kW plus the discharge power ${fmt(b.powerDischargeKw)} kW; raise the import limit or check the load profile`
        : `${stepLabel(ctx, t)}: surplus generation ${fmt(-net)} kW exceeds the export limit ${fmt(site.exportLimitKw ?? Infinity)} kW plus the charge power ${fmt(b.powerChargeKw)} kW; raise the export limit or check the generation profile`;
    }
    const nlo = Math.max(a * lo + (st.u[base] ?? 0), emin);
    const nhi = Math.min(a * hi + (st.u[end] ?? 0), emax);
    if (nlo > nhi + tol) {
      return `${stepLabel(ctx, t)}: the SoC window ${fmt(emin)}–${fmt(emax)} kWh cannot be kept: from ${fmt(lo)}–${fmt(hi)} kWh the battery can only reach ${fmt(a * lo + (st.u[base] ?? 0))}–${fmt(a * hi + (st.u[end] ?? 0))} kWh; check the initial SoC and the power limits`;
    }
    lo = Math.min(nlo, nhi);
    hi = nhi;
  }
  const last = stepLabel(ctx, to - 1);
  if (rule.kind === 'target') {
    const target = (b.energyKwh * rule.socPct) / 100;
    if (target > hi + tol) {
      return `terminal rule target:${rule.socPct} cannot be met: at the end of ${last} the battery holds at most ${fmt((hi / b.energyKwh) * 100)} % of its energy; lower the target or lengthen the horizon`;
    }
  } else if (rule.kind === 'cyclic' && (e0 < lo - tol || e0 > hi + tol)) {
    return `terminal rule cyclic cannot be met: the start energy ${fmt(e0)} kWh is outside what the battery can hold at the end of ${last} (${fmt(lo)}–${fmt(hi)} kWh); check the initial SoC and the SoC window`;
  }
  return null;
}
