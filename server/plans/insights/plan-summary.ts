/**
 * Headline figures of a plan's delivery window (the cost rule of docs/model.md):
 * money paid, what the battery earns against the same site without it,
 * equivalent full cycles, peak import.
 */
import type { PlanSummary } from '@shared/schemas/plan';
import { scheduleCost, type AlignedInputs, type DispatchSolution } from '../../engine';

export function summarisePlan(a: AlignedInputs, from: number, steps: number, sol: DispatchSolution): PlanSummary {
  const slice = (xs: readonly number[], offset = 0) => xs.slice(offset, offset + steps);
  const costInputs = {
    stepHours: a.stepHours,
    priceImport: slice(a.priceImport, from),
    priceExport: slice(a.priceExport, from),
    degradationCostPerMwh: a.battery.degradationCostPerMwh,
    demandChargePerKw: a.site.demandChargePerKw,
  };
  const cost = scheduleCost(costInputs, {
    dischargeKw: slice(sol.dischargeKw),
    gridImportKw: slice(sol.gridImportKw),
    gridExportKw: slice(sol.gridExportKw),
  });
  // The same site and prices without the battery: the grid carries load minus generation.
  const without = { dischargeKw: [] as number[], gridImportKw: [] as number[], gridExportKw: [] as number[] };
  for (let t = 0; t < steps; t++) {
    const net = a.loadKw[from + t]! - a.generationKw[from + t]!;
    without.dischargeKw.push(0);
    without.gridImportKw.push(Math.max(0, net));
    without.gridExportKw.push(Math.max(0, -net));
  }
  const baseline = scheduleCost(costInputs, without);
  const sum = (xs: readonly number[]) => xs.reduce((acc, v) => acc + v, 0);
  const chargedKwh = sum(slice(sol.chargeKw)) * a.stepHours;
  const dischargedKwh = sum(slice(sol.dischargeKw)) * a.stepHours;
  const usable = (a.battery.energyKwh * (a.battery.socMaxPct - a.battery.socMinPct)) / 100;
  const simultaneous = (sol.simultaneousSteps ?? []).filter((t) => t < steps).length;
  return {
    cost,
    earnings: baseline - cost,
    equivalentCycles: dischargedKwh / usable,
    peakImportKw: Math.max(0, ...slice(sol.gridImportKw)),
    chargedKwh,
    dischargedKwh,
    endSocPct: (sol.socKwh[steps]! / a.battery.energyKwh) * 100,
    simultaneousSteps: simultaneous,
  };
}
