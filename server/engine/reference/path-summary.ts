/**
 * The numbers people read off a solved path: totals and a per-interval series
 * with ISO times. SoC and stored-energy value are at the end of each interval.
 */
import type { DispatchSolution } from '../types';
import type { AlignedInputs } from '../inputs/align-inputs';
import { usableEnergyKwh } from '../inputs/problem-for';
import { scheduleCost } from '../dispatch/schedule-cost';
import { limitSummary, reserveAt } from '../limits/limit-summary';

export interface SeriesPoint {
  /** Start of the interval, ISO 8601 UTC. */
  readonly time: string;
  readonly priceImport: number;
  readonly chargeKw: number;
  readonly dischargeKw: number;
  /** Energy at the end of the interval, kWh. */
  readonly socKwh: number;
  readonly gridImportKw: number;
  readonly gridExportKw: number;
  /** Value of stored energy at the end of the interval, currency/MWh. */
  readonly storedEnergyValue: number;
  /** Upward and downward reserve held in the interval, kW (paths with reserve prices only). */
  readonly reserveUpKw?: number;
  readonly reserveDownKw?: number;
}

export interface PathSummary {
  /** Money paid incl. degradation and demand charge, minus reserve revenue, excl. terminal value (negative = earnings). */
  readonly cost: number;
  readonly chargedKwh: number;
  readonly dischargedKwh: number;
  readonly equivalentCycles: number;
  readonly steps: number;
  readonly series: readonly SeriesPoint[];
  /** Reserve availability payments earned, currency (paths with reserve prices only; already in `cost`). */
  readonly reserveRevenue?: number;
  /** Switching penalty, currency, not cash (paths with a switching cost only). */
  readonly switchingPenalty?: number;
}

/** Summary of solution steps [from, to) (relative to the solution), whose step 0 is grid step `offset`. */
export function summarizePath(
  inputs: AlignedInputs,
  solution: DispatchSolution,
  offset: number,
  from = 0,
  to = solution.chargeKw.length,
): PathSummary {
  const dt = inputs.stepHours;
  let charged = 0;
  let discharged = 0;
  const series: SeriesPoint[] = [];
  for (let t = from; t < to; t++) {
    charged += solution.chargeKw[t]! * dt;
    discharged += solution.dischargeKw[t]! * dt;
    series.push({
      time: new Date(inputs.timesMs[offset + t]!).toISOString(),
      priceImport: inputs.priceImport[offset + t]!,
      chargeKw: solution.chargeKw[t]!,
      dischargeKw: solution.dischargeKw[t]!,
      socKwh: solution.socKwh[t + 1]!,
      gridImportKw: solution.gridImportKw[t]!,
      gridExportKw: solution.gridExportKw[t]!,
      storedEnergyValue: solution.storedEnergyValue[t]!,
      ...reserveAt(solution, t),
    });
  }
  const cost = scheduleCost(
    {
      stepHours: dt,
      priceImport: inputs.priceImport.slice(offset, offset + solution.chargeKw.length),
      priceExport: inputs.priceExport.slice(offset, offset + solution.chargeKw.length),
      degradationCostPerMwh: inputs.battery.degradationCostPerMwh,
      demandChargePerKw: inputs.site.demandChargePerKw,
    },
    solution,
    from,
    to,
  );
  const limits = limitSummary(inputs, solution, offset, from, to);
  return {
    cost: cost - (limits.reserveRevenue ?? 0),
    chargedKwh: charged,
    dischargedKwh: discharged,
    equivalentCycles: discharged / usableEnergyKwh(inputs.battery),
    steps: to - from,
    series,
    ...limits,
  };
}
