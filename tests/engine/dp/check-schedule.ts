// Limit checks for a DispatchSolution, written straight from DESIGN section 3.
import type { DispatchProblem, DispatchSolution } from '../../../server/engine/types';

/** Returns the first broken limit, or null. Tolerances are 1e-6 relative to the battery size. */
export function brokenLimit(p: DispatchProblem, s: DispatchSolution): string | null {
  const n = p.priceImport.length;
  const b = p.battery;
  const dt = p.stepHours;
  const a = 1 - (b.selfDischargePctPerHour / 100) * dt;
  const tolE = 1e-6 * Math.max(1, b.energyKwh);
  const tolP = 1e-6 * Math.max(1, b.powerChargeKw + b.powerDischargeKw);
  const emin = (b.energyKwh * b.socMinPct) / 100;
  const emax = (b.energyKwh * b.socMaxPct) / 100;
  if (s.socKwh.length !== n + 1 || s.chargeKw.length !== n) return 'series lengths';
  if (s.socKwh[0] !== p.initialEnergyKwh) return 'socKwh[0] is not the initial energy';
  for (let t = 0; t < n; t++) {
    const c = s.chargeKw[t] ?? NaN;
    const d = s.dischargeKw[t] ?? NaN;
    const m = s.gridImportKw[t] ?? NaN;
    const x = s.gridExportKw[t] ?? NaN;
    const e0 = s.socKwh[t] ?? NaN;
    const e1 = s.socKwh[t + 1] ?? NaN;
    if (!(c >= -tolP && c <= b.powerChargeKw + tolP)) return `charge ${c} at step ${t}`;
    if (!(d >= -tolP && d <= b.powerDischargeKw + tolP)) return `discharge ${d} at step ${t}`;
    if (!(m >= -tolP && m <= (p.site.importLimitKw ?? Infinity) + tolP)) return `import ${m} at step ${t}`;
    if (!(x >= -tolP && x <= (p.site.exportLimitKw ?? Infinity) + tolP)) return `export ${x} at step ${t}`;
    if (!(e1 >= emin - tolE && e1 <= emax + tolE)) return `SoC ${e1} outside ${emin}..${emax} after step ${t}`;
    const dyn = a * e0 + b.efficiencyCharge * c * dt - (d * dt) / b.efficiencyDischarge;
    if (Math.abs(dyn - e1) > tolE) return `SoC equation off by ${dyn - e1} at step ${t}`;
    const bal = (p.loadKw[t] ?? 0) - (p.generationKw[t] ?? 0) + c - d;
    if (Math.abs(m - x - bal) > tolP) return `site balance off by ${m - x - bal} at step ${t}`;
  }
  const end = s.socKwh[n] ?? NaN;
  const rule = p.terminal;
  if (rule.kind === 'cyclic' && Math.abs(end - p.initialEnergyKwh) > tolE) return `cyclic end ${end} ≠ ${p.initialEnergyKwh}`;
  if (rule.kind === 'target' && end < (b.energyKwh * rule.socPct) / 100 - tolE) return `end ${end} below the target`;
  return null;
}

/** The money paid by a schedule, recomputed from its flows (DESIGN section 3). */
export function scheduleCost(p: DispatchProblem, s: DispatchSolution): number {
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
