import type { DispatchProblem } from '../types';
import { lpOnlyReason } from '../limits/limit-features';

export type DpEligibility = { ok: true } | { ok: false; reason: string };

/**
 * Whether the exact dynamic program can solve the problem. It needs stages
 * that are not coupled except through the SoC and a convex stage cost:
 * no demand charge (the peak couples all steps), no daily throughput cap
 * (it couples the steps of a day), and an export price never above the
 * import price (else importing to export pays and the stage cost is not
 * convex). Everything else (site load and generation, grid limits,
 * self-discharge, degradation cost, asymmetric powers and efficiencies,
 * negative prices, every terminal rule) is exact.
 */
export function canSolveWithDp(problem: DispatchProblem): DpEligibility {
  // Reserves, a ramp rate and a switching cost (DESIGN section 3.3) are not modelled here; availability is.
  const limits = lpOnlyReason(problem);
  if (limits !== null) return { ok: false, reason: limits };
  if (problem.freeInitialEnergy === true) {
    return { ok: false, reason: 'a free initial SoC (the steady cycle) makes the start a decision; the LP path solves it' };
  }
  const demand = problem.site.demandChargePerKw;
  if (demand !== null && demand !== 0) {
    return {
      ok: false,
      reason: `a demand charge (${demand} per kW) couples all steps through the peak import; the LP path solves it`,
    };
  }
  const cap = problem.battery.maxCyclesPerDay;
  if (cap !== null) {
    return {
      ok: false,
      reason: `a daily throughput cap (${cap} cycles per day) couples the steps of each day; the LP path solves it`,
    };
  }
  const n = problem.priceImport.length;
  for (let t = 0; t < n; t++) {
    const pi = problem.priceImport[t] ?? NaN;
    const px = problem.priceExport[t] ?? NaN;
    if (px > pi) {
      const ms = problem.timesMs[t];
      const when = ms === undefined ? '' : ` (${new Date(ms).toISOString()})`;
      return {
        ok: false,
        reason: `the export price ${px} is above the import price ${pi} at step ${t}${when}, so the stage cost is not convex; the LP path solves it`,
      };
    }
  }
  return { ok: true };
}

/** Checks the inputs the dynamic program relies on; returns a message naming the first bad one, or null. */
export function checkDpInput(problem: DispatchProblem): string | null {
  const n = problem.priceImport.length;
  if (n === 0) return 'the problem has no steps; give at least one price';
  if (!(problem.stepHours > 0) || !Number.isFinite(problem.stepHours))
    return `stepHours must be a positive number, got ${problem.stepHours}`;
  const series = ['timesMs', 'priceImport', 'priceExport', 'loadKw', 'generationKw'] as const;
  for (const key of series) {
    const values = problem[key];
    if (values.length !== n) return `${key} has ${values.length} values but priceImport has ${n}; give one per step`;
    for (let t = 0; t < n; t++) {
      if (!Number.isFinite(values[t])) return `${key}[${t}] is not a finite number (${values[t]}); fix step ${t} of the profile`;
    }
  }
  const b = problem.battery;
  const positive: [string, number][] = [
    ['powerChargeKw', b.powerChargeKw],
    ['powerDischargeKw', b.powerDischargeKw],
    ['energyKwh', b.energyKwh],
  ];
  for (const [name, v] of positive)
    if (!(v >= 0) || !Number.isFinite(v)) return `battery.${name} must be a finite number ≥ 0, got ${v}`;
  for (const [name, v] of [
    ['efficiencyCharge', b.efficiencyCharge],
    ['efficiencyDischarge', b.efficiencyDischarge],
  ] as const) {
    if (!(v > 0 && v <= 1)) return `battery.${name} must be in (0, 1], got ${v}`;
  }
  if (!(b.socMinPct >= 0 && b.socMinPct <= b.socMaxPct && b.socMaxPct <= 100)) {
    return `the SoC window ${b.socMinPct}–${b.socMaxPct} % is empty or outside 0–100 %; set 0 ≤ socMinPct ≤ socMaxPct ≤ 100`;
  }
  const sigma = (b.selfDischargePctPerHour / 100) * problem.stepHours;
  if (!(sigma >= 0 && sigma < 1))
    return `battery.selfDischargePctPerHour ${b.selfDischargePctPerHour} must be ≥ 0 and below 100 % per step`;
  if (!Number.isFinite(b.degradationCostPerMwh))
    return `battery.degradationCostPerMwh must be a finite number, got ${b.degradationCostPerMwh}`;
  if (!Number.isFinite(problem.initialEnergyKwh))
    return `initialEnergyKwh must be a finite number, got ${problem.initialEnergyKwh}`;
  for (const [name, v] of [
    ['importLimitKw', problem.site.importLimitKw],
    ['exportLimitKw', problem.site.exportLimitKw],
  ] as const) {
    if (v !== null && !(v >= 0)) return `site.${name} must be null or ≥ 0, got ${v}`;
  }
  const rule = problem.terminal;
  if (rule.kind === 'target' && !Number.isFinite(rule.socPct)) return `terminal target SoC must be a number, got ${rule.socPct}`;
  if (rule.kind === 'steady-value' && !Number.isFinite(rule.valuePerMwh))
    return `terminal steady value must be a number, got ${rule.valuePerMwh}`;
  return null;
}
