/**
 * The engine's net figures (cash cost, change in stored energy's value, net
 * cost, the site without a battery, the battery's value) in the API's shape,
 * shared by plans, studies and the horizon preview.
 */
import type { NetMoney, StoredEnergyValuation } from '@shared/schemas/plan';
import type { NetFigures, StoredEnergyValuation as EngineValuation } from '../engine';

const finiteOrNull = (v: number) => (Number.isFinite(v) ? v : null);

/** How stored energy was valued, in the API's shape (values per MWh are null when it is not valued: JSON has no NaN). */
export function valuationOf(v: EngineValuation): StoredEnergyValuation {
  return {
    valued: v.valued,
    startValuePerMwh: finiteOrNull(v.startValuePerMwh),
    endValuePerMwh: finiteOrNull(v.endValuePerMwh),
    startClock: v.startClock,
    endClock: v.endClock,
    startEnergyKwh: v.startEnergyKwh,
    endEnergyKwh: v.endEnergyKwh,
    description: v.description,
  };
}

/** The engine's net figures in the API's shape. */
export function netMoney(net: NetFigures): NetMoney {
  return {
    storedEnergyChange: net.storedEnergyChange,
    netCost: net.netCost,
    noBatteryCost: net.noBatteryCost,
    batteryValue: net.batteryValue,
    storedEnergyValuation: valuationOf(net.storedEnergyValuation),
  };
}
