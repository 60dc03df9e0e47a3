// Hand-written dispatch problems for worked fixtures: hourly steps, UTC, one
// local day, pure arbitrage unless a site is given.
import type { BatteryParams, DispatchProblem, SiteParams, TerminalRule } from '../../../server/engine/types';

export function battery(overrides: Partial<BatteryParams> = {}): BatteryParams {
  return {
    powerChargeKw: 1000,
    powerDischargeKw: 1000,
    energyKwh: 1000,
    socMinPct: 0,
    socMaxPct: 100,
    socInitialPct: 0,
    efficiencyCharge: 1,
    efficiencyDischarge: 1,
    selfDischargePctPerHour: 0,
    degradationCostPerMwh: 0,
    maxCyclesPerDay: null,
    ...overrides,
  };
}

/** Steps [from, to) of a problem as a problem of its own (a receding-horizon window, a truncation). */
export function windowOf(p: DispatchProblem, from: number, to: number, over: Partial<DispatchProblem> = {}): DispatchProblem {
  const cut = <T>(xs: readonly T[]): T[] => xs.slice(from, to);
  return {
    ...p,
    timesMs: cut(p.timesMs),
    priceImport: cut(p.priceImport),
    priceExport: cut(p.priceExport),
    loadKw: cut(p.loadKw),
    generationKw: cut(p.generationKw),
    dayIndex: cut(p.dayIndex),
    ...over,
  };
}

export const NO_SITE: SiteParams = { timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null };

export function problem(
  prices: readonly number[],
  options: {
    battery?: BatteryParams;
    site?: SiteParams;
    terminal?: TerminalRule;
    initialEnergyKwh?: number;
    loadKw?: readonly number[];
    stepHours?: number;
  } = {},
): DispatchProblem {
  const b = options.battery ?? battery();
  const stepHours = options.stepHours ?? 1;
  return {
    stepHours,
    timesMs: prices.map((_, t) => Date.UTC(2026, 0, 1) + t * stepHours * 3_600_000),
    priceImport: prices,
    priceExport: prices,
    loadKw: options.loadKw ?? prices.map(() => 0),
    generationKw: prices.map(() => 0),
    battery: b,
    site: options.site ?? NO_SITE,
    initialEnergyKwh: options.initialEnergyKwh ?? (b.energyKwh * b.socInitialPct) / 100,
    terminal: options.terminal ?? { kind: 'free' },
    dayIndex: prices.map(() => 0),
  };
}
