import { describe, expect, it } from 'vitest';
import { batterySchema } from '@shared/schemas/battery';
import { lithiumIonDefaults, withLithiumIonDefaults } from '@shared/schemas/battery-defaults';
import { batteryWarnings } from '@shared/schemas/battery-warnings';

describe('lithium-ion battery defaults', () => {
  const defaults = lithiumIonDefaults(4000);

  it('gives a round trip of 85 % split evenly between charging and discharging', () => {
    // [S: NREL ATB 2020] round trip 0.85, split √0.85 per direction (docs/sources.md);
    // [D] rounding each direction to 3 decimals moves the product by under 1e-4.
    expect(defaults.efficiencyCharge).toBe(defaults.efficiencyDischarge);
    expect(defaults.efficiencyCharge * defaults.efficiencyDischarge).toBeCloseTo(0.85, 3);
  });

  it('sizes power for a 2-hour duration and allows about one cycle per day', () => {
    // [S: NREL ATB 2020 and 2023] 2 h among the most common durations; about one cycle per day.
    expect(defaults.energyKwh / defaults.powerDischargeKw).toBe(2);
    expect(defaults.energyKwh / defaults.powerChargeKw).toBe(2);
    expect(defaults.maxCyclesPerDay).toBe(1);
  });

  it('keeps a 10–90 % window, starts mid-window, and has no self-discharge or degradation cost', () => {
    // [M: common practice] 10–90 %; [S: battery reference tables] self-discharge negligible within a day;
    // [M] degradation cost is a user parameter defaulting to 0.
    expect([defaults.socMinPct, defaults.socMaxPct, defaults.socInitialPct]).toEqual([10, 90, 50]);
    expect(defaults.selfDischargePctPerHour).toBe(0);
    expect(defaults.degradationCostPerMwh).toBe(0);
  });

  it('produces a valid battery with no warnings, the demo 2 MW / 4 MWh size included', () => {
    const battery = withLithiumIonDefaults({ name: 'Demo', energyKwh: 4000 });
    expect(batterySchema.safeParse(battery).success).toBe(true);
    expect(battery.powerChargeKw).toBe(2000);
    expect(batteryWarnings(battery)).toEqual([]);
  });

  it('keeps every value the request gave and fills only the rest', () => {
    const battery = withLithiumIonDefaults({ name: 'Custom', energyKwh: 1000, powerChargeKw: 250, maxCyclesPerDay: null });
    expect(battery.powerChargeKw).toBe(250);
    expect(battery.powerDischargeKw).toBe(500);
    expect(battery.maxCyclesPerDay).toBeNull();
  });
});

describe('battery validation and warnings', () => {
  const base = { name: 'B', ...lithiumIonDefaults(4000) };

  it('refuses an empty SoC window and an initial SoC outside it, naming the field', () => {
    const empty = batterySchema.safeParse({ ...base, socMinPct: 60, socMaxPct: 40, socInitialPct: 50 });
    expect(empty.success).toBe(false);
    expect(empty.error?.issues[0]?.path).toEqual(['socMaxPct']);
    const outside = batterySchema.safeParse({ ...base, socInitialPct: 95 });
    expect(outside.error?.issues[0]?.path).toEqual(['socInitialPct']);
    expect(outside.error?.issues[0]?.message).toMatch(/10–90 %/);
  });

  it('refuses efficiencies written as percentages', () => {
    const result = batterySchema.safeParse({ ...base, efficiencyCharge: 92 });
    expect(result.error?.issues[0]?.message).toMatch(/enter 0\.92, not 92/);
  });

  it('warns, without refusing, on a 0–100 % window, efficiencies above 0.98 and C-rates above 1', () => {
    // The cautions name these three as outside common practice (docs/model.md).
    const risky = {
      ...base,
      socMinPct: 0,
      socMaxPct: 100,
      efficiencyCharge: 0.99,
      efficiencyDischarge: 0.99,
      powerDischargeKw: 6000,
    };
    expect(batterySchema.safeParse(risky).success).toBe(true);
    const fields = batteryWarnings(risky).map((w) => w.field);
    expect(fields).toEqual(['socMinPct', 'socMaxPct', 'efficiencyCharge', 'efficiencyDischarge', 'powerDischargeKw']);
  });

  it('warns on a round trip far below fleet averages and on power above the site limits', () => {
    // [S: US EIA 2021] fleet average 82 %; 0.8 × 0.8 = 64 % is far below it [D].
    const warnings = batteryWarnings(
      { ...base, efficiencyCharge: 0.8, efficiencyDischarge: 0.8 },
      { importLimitKw: 1500, exportLimitKw: null },
    );
    expect(warnings.map((w) => w.field)).toEqual([null, 'powerChargeKw']);
    expect(warnings[0]?.message).toMatch(/is 64 %/);
  });
});
