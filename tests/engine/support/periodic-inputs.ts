// Aligned inputs with exactly daily-periodic prices (a morning and an evening
// peak), for turnpike checks: their optimal regime is the steady cycle.
import { alignInputs, type AlignedInputs } from '../../../server/engine/inputs/align-inputs';
import type { BatteryParams } from '../../../server/engine/types';
import { battery } from './problem-builder';

/** 1 MW / 4 MWh at 85 % round trip, the battery of the turnpike check values (docs/sources.md). */
export const TURNPIKE_BATTERY: BatteryParams = battery({
  powerChargeKw: 1000,
  powerDischargeKw: 1000,
  energyKwh: 4000,
  efficiencyCharge: Math.sqrt(0.85),
  efficiencyDischarge: Math.sqrt(0.85),
  socInitialPct: 0,
});

/** The ramp 0.4·hour breaks the sine's mirror symmetry, which would tie pairs of hours at equal prices. */
export function dailyPrice(hour: number): number {
  return 60 + 25 * Math.sin((2 * Math.PI * (hour - 9)) / 24) + 15 * Math.sin((4 * Math.PI * hour) / 24) + 0.4 * hour;
}

export function periodicInputs(days: number, b: BatteryParams = TURNPIKE_BATTERY): AlignedInputs {
  const values = Array.from({ length: 24 * days }, (_, t) => Math.round(100 * dailyPrice(t % 24)) / 100);
  const aligned = alignInputs({
    battery: b,
    site: { timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null },
    prices: { startMs: Date.UTC(2026, 3, 6), stepMinutes: 60, values },
  });
  if (!aligned.ok) throw new Error(aligned.issue.message);
  return aligned.inputs;
}
