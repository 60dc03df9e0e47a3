// Every operating limit of DESIGN section 3.3 checked on a solved schedule, read
// from the schedule and the reserve it reports (not from the solver): power with
// reserve and availability, energy headroom at both ends of each interval, grid
// headroom, ramp rate; and the money figures recomputed from their definitions.
// Returns the list of broken limits (empty = all kept).
import type { DispatchProblem, DispatchSolution } from '../../../server/engine/types';

export function brokenOperatingLimits(p: DispatchProblem, s: DispatchSolution): string[] {
  const b = p.battery;
  const dt = p.stepHours;
  const n = p.priceImport.length;
  const tolKwh = 1e-6 * b.energyKwh + 1e-6;
  const tolKw = 1e-6 * (b.powerChargeKw + b.powerDischargeKw) + 1e-6;
  const eMin = (b.energyKwh * b.socMinPct) / 100;
  const eMax = (b.energyKwh * b.socMaxPct) / 100;
  const D = p.reserveHours ?? 0;
  const reserves = p.reserveUpPrice !== undefined || p.reserveDownPrice !== undefined;
  const broken: string[] = [];
  const check = (ok: boolean, what: string) => {
    if (!ok) broken.push(what);
  };
  if (reserves) check(s.reserveUpKw?.length === n && s.reserveDownKw?.length === n, 'reserve series');
  let revenue = 0;
  let moved = 0;
  let cash = 0;
  let peak = 0;
  for (let t = 0; t < n; t++) {
    const [c, d] = [s.chargeKw[t]!, s.dischargeKw[t]!];
    const [ru, rd] = [s.reserveUpKw?.[t] ?? 0, s.reserveDownKw?.[t] ?? 0];
    const a = p.availability?.[t] ?? 1;
    check(ru >= -tolKw && rd >= -tolKw, `reserve sign at step ${t}`);
    if (!p.reserveUpPrice) check(ru <= tolKw, `upward reserve without a price at step ${t}`);
    if (!p.reserveDownPrice) check(rd <= tolKw, `downward reserve without a price at step ${t}`);
    check(c <= a * b.powerChargeKw + tolKw && d <= a * b.powerDischargeKw + tolKw, `availability at step ${t}`);
    check(d - c + ru <= a * b.powerDischargeKw + tolKw, `upward power headroom at step ${t}`);
    check(c - d + rd <= a * b.powerChargeKw + tolKw, `downward power headroom at step ${t}`);
    for (const [e, end] of [
      [s.socKwh[t]!, 'start'],
      [s.socKwh[t + 1]!, 'end'],
    ] as const) {
      check(e - (ru * D) / b.efficiencyDischarge >= eMin - tolKwh, `upward energy headroom at the ${end} of step ${t}`);
      check(e + rd * D * b.efficiencyCharge <= eMax + tolKwh, `downward energy headroom at the ${end} of step ${t}`);
    }
    const exported = s.gridExportKw[t]! - s.gridImportKw[t]!;
    if (p.site.exportLimitKw !== null) check(exported + ru <= p.site.exportLimitKw + tolKw, `export headroom at step ${t}`);
    if (p.site.importLimitKw !== null) check(-exported + rd <= p.site.importLimitKw + tolKw, `import headroom at step ${t}`);
    const before = t > 0 ? s.dischargeKw[t - 1]! - s.chargeKw[t - 1]! : p.initialNetPowerKw;
    if (before !== undefined) {
      const change = Math.abs(d - c - before);
      moved += change;
      if (b.rampKwPerMin != null) check(change <= b.rampKwPerMin * 60 * dt + tolKw, `ramp rate at step ${t}`);
    }
    revenue += ((p.reserveUpPrice?.[t] ?? 0) * ru + (p.reserveDownPrice?.[t] ?? 0) * rd) * dt;
    cash += (p.priceImport[t]! * s.gridImportKw[t]! - p.priceExport[t]! * s.gridExportKw[t]! + b.degradationCostPerMwh * d) * dt;
    peak = Math.max(peak, s.gridImportKw[t]!);
  }
  // [D] DESIGN 3.3: cost is cash: energy, degradation and demand charge, minus reserve revenue.
  const demand = p.site.demandChargePerKw !== null ? p.site.demandChargePerKw * peak : 0;
  const tolMoney = 1e-6 * (1 + Math.abs(cash / 1000) + Math.abs(revenue / 1000) + demand);
  check(
    Math.abs(s.cost - (cash / 1000 + demand - revenue / 1000)) <= tolMoney,
    'cost = energy + degradation + demand − reserve revenue',
  );
  const money = 1e-6 * (1 + Math.abs(s.objective));
  if (reserves) check(Math.abs((s.reserveRevenue ?? NaN) - revenue / 1000) <= money, 'reserve revenue');
  const penalty = ((b.switchingCostPerMw ?? 0) * moved) / 1000;
  if (b.switchingCostPerMw) check(Math.abs((s.switchingPenalty ?? NaN) - penalty) <= money, 'switching penalty');
  // [D] DESIGN 3.3: objective = cost + switching penalty − terminal value.
  const terminal = p.terminal.kind === 'steady-value' ? (p.terminal.valuePerMwh * s.socKwh[n]!) / 1000 : 0;
  check(Math.abs(s.objective - (s.cost + penalty - terminal)) <= money, 'objective = cost + switching penalty − terminal value');
  return broken;
}
