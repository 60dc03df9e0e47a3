/**
 * Input checks of the operating limits of DESIGN section 3.3, run with the rest
 * of validateProblem. Each names the parameter or the first interval at fault
 * (with its local time) and says how to fix it, so a bad input never reaches the
 * solver as an unexplained "infeasible".
 */
import type { DispatchProblem } from '../types';
import type { InputIssue } from '../model/validate-battery';
import { rampWindowIssue } from './ramp-feasibility';

/** Words for step t, e.g. "step 4 (2026-05-06 01:00 CEST)". */
type Label = (t: number) => string;

const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function checkBatteryLimits(p: DispatchProblem): InputIssue | null {
  const { rampKwPerMin: ramp, switchingCostPerMw: switching } = p.battery;
  if (ramp != null && !(finite(ramp) && ramp > 0)) {
    return {
      field: 'battery.rampKwPerMin',
      message: `battery.rampKwPerMin is ${String(ramp)}; it must be more than 0 kW per minute, or null for no ramp limit`,
    };
  }
  if (switching != null && !(finite(switching) && switching >= 0)) {
    return {
      field: 'battery.switchingCostPerMw',
      message: `battery.switchingCostPerMw is ${String(switching)}; it must be zero or more per MW, or null for none`,
    };
  }
  const given = p.initialNetPowerKw;
  if (given !== undefined && !(finite(given) && given >= -p.battery.powerChargeKw && given <= p.battery.powerDischargeKw)) {
    return {
      field: 'initialNetPowerKw',
      message: `the initial net power ${String(given)} kW is outside what the battery can do (−${p.battery.powerChargeKw} kW charging to ${p.battery.powerDischargeKw} kW discharging)`,
    };
  }
  return null;
}

/** First and last step of the first run of missing (non-finite) values, or null when all are present. */
function missingRun(series: readonly number[]): [number, number] | null {
  const first = series.findIndex((v) => !finite(v));
  if (first < 0) return null;
  let last = first;
  while (last + 1 < series.length && !finite(series[last + 1])) last++;
  return [first, last];
}

function checkAvailability(p: DispatchProblem, n: number, stepLabel: Label): InputIssue | null {
  const a = p.availability;
  if (a === undefined) return null;
  if (a.length !== n) {
    return { field: 'availability', message: `the availability series has ${a.length} values but the price series has ${n}` };
  }
  const missing = missingRun(a);
  if (missing) {
    return {
      field: 'availability',
      step: missing[0],
      message: `the availability profile does not cover the window: no value from ${stepLabel(missing[0])} to ${stepLabel(missing[1])}; upload availability for the whole window or plan without it`,
    };
  }
  const t = a.findIndex((v) => v < 0 || v > 1);
  if (t >= 0) {
    return {
      field: 'availability',
      step: t,
      message: `the availability at ${stepLabel(t)} is ${a[t]}; it must be a fraction between 0 and 1`,
    };
  }
  return null;
}

function checkReserves(p: DispatchProblem, n: number, stepLabel: Label): InputIssue | null {
  const sides = [
    ['reserveUpPrice', 'upward reserve price', p.reserveUpPrice],
    ['reserveDownPrice', 'downward reserve price', p.reserveDownPrice],
  ] as const;
  for (const [field, label, series] of sides) {
    if (series === undefined) continue;
    if (series.length !== n) {
      return { field, message: `the ${label} series has ${series.length} values but the price series has ${n}` };
    }
    const missing = missingRun(series);
    if (missing) {
      return {
        field,
        step: missing[0],
        message: `the ${label} profile does not cover the window: no price from ${stepLabel(missing[0])} to ${stepLabel(missing[1])}; upload ${label}s for the whole window or plan without that reserve`,
      };
    }
  }
  if (p.reserveUpPrice === undefined && p.reserveDownPrice === undefined) return null;
  const hours = p.reserveHours;
  if (!(finite(hours) && hours > 0)) {
    return {
      field: 'reserveHours',
      message: `reserves need a delivery duration (reserveHours) of more than 0 hours, e.g. 1; got ${String(hours)}`,
    };
  }
  return null;
}

/** The first problem with the operating limits of a dispatch problem, or null. */
export function validateLimits(p: DispatchProblem, label: Label): InputIssue | null {
  const n = p.priceImport.length;
  return checkBatteryLimits(p) ?? checkAvailability(p, n, label) ?? checkReserves(p, n, label) ?? rampWindowIssue(p, label);
}
