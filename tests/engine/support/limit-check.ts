// Checks of a solved schedule written straight from the model (docs/model.md),
// independently of the engine: every limit (power, SoC window, SoC dynamics, site
// balance, grid limits, daily throughput cap, terminal rule) and the money paid.
import type { DispatchProblem, DispatchSolution } from '../../../server/engine/types';

/** The list of broken limits (empty = all kept). */
export function brokenLimits(p: DispatchProblem, s: DispatchSolution): string[] {
  const b = p.battery;
  const dt = p.stepHours;
  const n = p.priceImport.length;
  const tolKwh = 1e-6 * b.energyKwh + 1e-6;
  const tolKw = 1e-6 * (b.powerChargeKw + b.powerDischargeKw) + 1e-6;
  const eMin = (b.energyKwh * b.socMinPct) / 100;
  const eMax = (b.energyKwh * b.socMaxPct) / 100;
  const keep = 1 - (b.selfDischargePctPerHour / 100) * dt;
  const broken: string[] = [];
  const check = (ok: boolean, what: string) => {
    if (!ok) broken.push(what);
  };
  check(s.chargeKw.length === n && s.socKwh.length === n + 1, 'series lengths');
  if (!p.freeInitialEnergy) check(Math.abs(s.socKwh[0]! - p.initialEnergyKwh) <= tolKwh, 'start energy');
  const dischargedByDay = new Map<number, number>();
  for (let t = 0; t < n; t++) {
    const [c, d, m, x] = [s.chargeKw[t]!, s.dischargeKw[t]!, s.gridImportKw[t]!, s.gridExportKw[t]!];
    check(c >= -tolKw && c <= b.powerChargeKw + tolKw, `charge power at step ${t}`);
    check(d >= -tolKw && d <= b.powerDischargeKw + tolKw, `discharge power at step ${t}`);
    check(m >= -tolKw && m <= (p.site.importLimitKw ?? Infinity) + tolKw, `import limit at step ${t}`);
    check(x >= -tolKw && x <= (p.site.exportLimitKw ?? Infinity) + tolKw, `export limit at step ${t}`);
    check(s.socKwh[t + 1]! >= eMin - tolKwh && s.socKwh[t + 1]! <= eMax + tolKwh, `SoC window after step ${t}`);
    const expected = keep * s.socKwh[t]! + b.efficiencyCharge * c * dt - (d * dt) / b.efficiencyDischarge;
    check(Math.abs(expected - s.socKwh[t + 1]!) <= tolKwh, `SoC dynamics at step ${t}`);
    check(Math.abs(m - x - (p.loadKw[t]! - p.generationKw[t]! + c - d)) <= tolKw, `site balance at step ${t}`);
    dischargedByDay.set(p.dayIndex[t]!, (dischargedByDay.get(p.dayIndex[t]!) ?? 0) + d * dt);
  }
  if (b.maxCyclesPerDay !== null) {
    for (const [day, kwh] of dischargedByDay)
      check(kwh <= b.maxCyclesPerDay * (eMax - eMin) + tolKwh, `throughput cap on day ${day}`);
  }
  const end = s.socKwh[n]!;
  if (p.terminal.kind === 'cyclic') check(Math.abs(end - s.socKwh[0]!) <= tolKwh, 'cyclic end');
  if (p.terminal.kind === 'target') check(end >= (b.energyKwh * p.terminal.socPct) / 100 - tolKwh, 'end target');
  return broken;
}

/** The money paid by a schedule, recomputed from its flows: Σ (π_imp·m − π_exp·x + c_deg·d)·Δt/1000. */
export function recomputedCost(p: DispatchProblem, s: DispatchSolution): number {
  let cost = 0;
  for (let t = 0; t < p.priceImport.length; t++) {
    cost +=
      (((p.priceImport[t] ?? 0) * (s.gridImportKw[t] ?? 0) -
        (p.priceExport[t] ?? 0) * (s.gridExportKw[t] ?? 0) +
        p.battery.degradationCostPerMwh * (s.dischargeKw[t] ?? 0)) *
        p.stepHours) /
      1000;
  }
  return cost;
}
