/**
 * Money paid for a schedule, as docs/model.md defines it (terminal value
 * excluded): Σ (π_imp·m − π_exp·x)·Δt/1000 + c_deg·Σ d·Δt/1000 + D·max m.
 * Used for plans and for the realised cost of closed-loop runs alike, so both are
 * measured with the same rule.
 */
export interface CostInputs {
  readonly stepHours: number;
  readonly priceImport: readonly number[];
  readonly priceExport: readonly number[];
  readonly degradationCostPerMwh: number;
  readonly demandChargePerKw: number | null;
}

export interface CostedSeries {
  readonly dischargeKw: ArrayLike<number>;
  readonly gridImportKw: ArrayLike<number>;
  readonly gridExportKw: ArrayLike<number>;
}

export function scheduleCost(inputs: CostInputs, series: CostedSeries, from = 0, to = series.dischargeKw.length): number {
  const dt = inputs.stepHours;
  let energy = 0;
  let discharged = 0;
  let peak = 0;
  for (let t = from; t < to; t++) {
    const m = series.gridImportKw[t]!;
    energy += inputs.priceImport[t]! * m - inputs.priceExport[t]! * series.gridExportKw[t]!;
    discharged += series.dischargeKw[t]!;
    if (m > peak) peak = m;
  }
  const demand = inputs.demandChargePerKw !== null ? inputs.demandChargePerKw * peak : 0;
  return ((energy + inputs.degradationCostPerMwh * discharged) * dt) / 1000 + demand;
}
