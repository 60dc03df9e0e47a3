/** The battery form's layout: fields grouped as planners think of them, with where each default comes from. */
import type { BatteryParams } from '@shared/schemas/battery';
import { DEFAULT_ROUND_TRIP } from '@shared/schemas/battery-defaults';

export interface FieldGroup {
  legend: string;
  fields: { key: keyof BatteryParams; hint: string }[];
}

export const BATTERY_FIELD_GROUPS: FieldGroup[] = [
  {
    legend: 'Size',
    fields: [
      { key: 'energyKwh', hint: 'Nameplate energy.' },
      { key: 'powerChargeKw', hint: 'Default: energy ÷ 2 h, a common duration (NREL ATB).' },
      { key: 'powerDischargeKw', hint: 'Default: energy ÷ 2 h.' },
    ],
  },
  {
    legend: 'State-of-charge window',
    fields: [
      { key: 'socMinPct', hint: 'Default 10 % (common practice).' },
      { key: 'socMaxPct', hint: 'Default 90 % (common practice).' },
      { key: 'socInitialPct', hint: 'Where plans start unless told otherwise; default mid-window.' },
    ],
  },
  {
    legend: 'Efficiency and losses',
    fields: [
      {
        key: 'efficiencyCharge',
        hint: `Default √${DEFAULT_ROUND_TRIP} ≈ 0.922: ${DEFAULT_ROUND_TRIP * 100} % round trip (NREL ATB 2020).`,
      },
      { key: 'efficiencyDischarge', hint: 'Default ≈ 0.922, as for charging.' },
      { key: 'selfDischargePctPerHour', hint: 'Lithium-ion loses a few % per month: default 0.' },
    ],
  },
  {
    legend: 'Costs and limits',
    fields: [
      { key: 'degradationCostPerMwh', hint: 'Charged per MWh discharged; default 0 (your choice, not a law).' },
      { key: 'maxCyclesPerDay', hint: 'Equivalent full cycles per local day; empty = no limit. Default 1.' },
    ],
  },
];
