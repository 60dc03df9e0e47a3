/**
 * A battery at a site with every parameter of the model (docs/model.md), under the same
 * keys as the engine's battery JSON (its contract). Units:
 * kW, kWh, % of nameplate energy, efficiencies as fractions, currency/MWh.
 */
import { z } from 'zod';

// zod 4 numbers already refuse NaN and ±Infinity.
const num = (message: string) => z.number({ error: message });

const positiveKw = (what: string) =>
  num(`Enter the ${what} in kW.`)
    .gt(0, `The ${what} must be above 0 kW.`)
    .max(10_000_000, `The ${what} is above 10 GW: enter it in kW.`);

const pct = (what: string) =>
  num(`Enter the ${what} in %.`).min(0, `The ${what} is at least 0 %.`).max(100, `The ${what} is at most 100 %.`);

const efficiency = (what: string) =>
  num(`Enter the ${what} as a fraction, e.g. 0.92.`)
    .gt(0, `The ${what} must be above 0.`)
    .max(1, `The ${what} is a fraction of at most 1 (enter 0.92, not 92).`);

export const batteryFieldsSchema = z.strictObject({
  name: z.string().trim().min(1, 'Give the battery a name.').max(120, 'Use at most 120 characters.'),
  powerChargeKw: positiveKw('charge power'),
  powerDischargeKw: positiveKw('discharge power'),
  energyKwh: num('Enter the nameplate energy in kWh.')
    .gt(0, 'The energy must be above 0 kWh.')
    .max(100_000_000, 'The energy is above 100 GWh: enter it in kWh.'),
  socMinPct: pct('minimum state of charge'),
  socMaxPct: pct('maximum state of charge'),
  socInitialPct: pct('initial state of charge'),
  efficiencyCharge: efficiency('charging efficiency'),
  efficiencyDischarge: efficiency('discharging efficiency'),
  selfDischargePctPerHour: num('Enter the self-discharge in % per hour.')
    .min(0, 'Self-discharge cannot be negative.')
    .lt(100, 'Self-discharge must be below 100 % per hour.'),
  degradationCostPerMwh: num('Enter the degradation cost per MWh discharged.').min(0, 'The degradation cost cannot be negative.'),
  /** Daily cap on equivalent full cycles; null = none. */
  maxCyclesPerDay: num('Enter the cycle limit per day, or leave it empty for none.')
    .gt(0, 'The cycle limit must be above 0, or empty for none.')
    .max(48, 'At most 48 cycles per day.')
    .nullable(),
});

export type BatteryParams = Omit<z.infer<typeof batteryFieldsSchema>, 'name'>;
export type BatteryFields = z.infer<typeof batteryFieldsSchema>;

/** Rules between fields, applied to whole batteries (after a PATCH is merged). */
function checkWindow(b: BatteryFields, ctx: z.RefinementCtx) {
  if (b.socMinPct >= b.socMaxPct) {
    ctx.addIssue({ code: 'custom', path: ['socMaxPct'], message: 'The maximum state of charge must be above the minimum.' });
  } else if (b.socInitialPct < b.socMinPct || b.socInitialPct > b.socMaxPct) {
    ctx.addIssue({
      code: 'custom',
      path: ['socInitialPct'],
      message: `The initial state of charge must lie in the window ${b.socMinPct}–${b.socMaxPct} %.`,
    });
  }
}

/** A whole, valid battery. */
export const batterySchema = batteryFieldsSchema.superRefine(checkWindow);

/**
 * POST body: name and energy are required; every other parameter may be left
 * out and is then filled with the lithium-ion defaults (battery-defaults.ts).
 */
export const batteryCreateSchema = batteryFieldsSchema.partial().required({ name: true, energyKwh: true });

/** PATCH body: any subset of the fields plus the version read (optimistic locking). */
export const batteryPatchSchema = batteryFieldsSchema.partial().extend({
  version: z.number({ error: 'Send the version you read, to detect a concurrent edit.' }).int().min(1),
});

export type BatteryCreateInput = z.infer<typeof batteryCreateSchema>;
export type BatteryPatch = z.infer<typeof batteryPatchSchema>;

/** The field named by a warning, or null for the battery as a whole. */
export interface BatteryWarning {
  field: keyof BatteryFields | null;
  message: string;
}

export interface Battery extends BatteryFields {
  id: string;
  siteId: string;
  version: number;
  createdBy: string;
  createdAt: string;
  updatedAt: string;
  /** Settings outside common practice (docs/model.md): allowed, but check them. */
  warnings: BatteryWarning[];
}

/** Human labels and units, shared by the form, the list and messages. */
export const BATTERY_FIELD_LABELS: Readonly<Record<keyof BatteryParams, { label: string; unit: string }>> = {
  powerChargeKw: { label: 'Charge power', unit: 'kW' },
  powerDischargeKw: { label: 'Discharge power', unit: 'kW' },
  energyKwh: { label: 'Energy (nameplate)', unit: 'kWh' },
  socMinPct: { label: 'Minimum state of charge', unit: '%' },
  socMaxPct: { label: 'Maximum state of charge', unit: '%' },
  socInitialPct: { label: 'Initial state of charge', unit: '%' },
  efficiencyCharge: { label: 'Charging efficiency', unit: 'fraction' },
  efficiencyDischarge: { label: 'Discharging efficiency', unit: 'fraction' },
  selfDischargePctPerHour: { label: 'Self-discharge', unit: '% per hour' },
  degradationCostPerMwh: { label: 'Degradation cost', unit: 'currency/MWh discharged' },
  maxCyclesPerDay: { label: 'Cycle limit', unit: 'cycles per day' },
};
