/**
 * Input checks of a DispatchProblem that would otherwise end as a silent wrong
 * answer or an unexplained "infeasible". The message names the first offending
 * parameter or interval (with its local time) and says how to fix it.
 */
import type { DispatchProblem } from '../types';
import { clockLabel, localTimeLabel } from '../time/zone-offsets';
import { energyBounds } from './build-dispatch-model';
import { validateBattery, validateSite, type InputIssue } from './validate-battery';
import { validateLimits } from '../limits/validate-limits';

export type { InputIssue };

const SERIES = [
  ['priceImport', 'import price'],
  ['priceExport', 'export price'],
  ['loadKw', 'load'],
  ['generationKw', 'generation'],
] as const;

export function stepLabel(problem: DispatchProblem, t: number): string {
  const ms = problem.timesMs[t];
  if (ms === undefined || !Number.isFinite(ms)) return `step ${t}`;
  // The steady cycle's steps are clock slots of a representative day (minutes after midnight), not instants.
  if (problem.freeInitialEnergy) return `the ${clockLabel(Math.round(ms / 60_000))} slot of the representative day`;
  return `step ${t} (${localTimeLabel(problem.site.timezone, ms)})`;
}

function validateSeries(p: DispatchProblem): InputIssue | null {
  const n = p.priceImport.length;
  if (n === 0) return { field: 'priceImport', message: 'the price profile has no intervals in the chosen period' };
  if (!(p.stepHours > 0) || !Number.isFinite(p.stepHours)) {
    return { field: 'stepHours', message: `the step length must be a positive number of hours (got ${p.stepHours})` };
  }
  for (const [key, label] of [...SERIES, ['timesMs', 'time'] as const, ['dayIndex', 'day index'] as const]) {
    const series = p[key];
    if (series.length !== n) {
      return { field: key, message: `the ${label} series has ${series.length} values but the price series has ${n}` };
    }
  }
  for (const [key, label] of SERIES) {
    const series = p[key];
    for (let t = 0; t < n; t++) {
      if (!Number.isFinite(series[t])) {
        return {
          field: key,
          step: t,
          message: `the ${label} profile has no valid number at ${stepLabel(p, t)}: fill the gap or fix the value`,
        };
      }
    }
  }
  for (const [key, label] of [
    ['loadKw', 'load'],
    ['generationKw', 'generation'],
  ] as const) {
    const t = p[key].findIndex((v) => v < 0);
    if (t >= 0) return { field: key, step: t, message: `the ${label} is negative (${p[key][t]} kW) at ${stepLabel(p, t)}` };
  }
  return null;
}

/** Steps that no battery schedule can serve: checked per step before solving. */
function validateStepFeasibility(p: DispatchProblem): InputIssue | null {
  const { importLimitKw, exportLimitKw } = p.site;
  const { powerChargeKw, powerDischargeKw } = p.battery;
  for (let t = 0; t < p.loadKw.length; t++) {
    const net = p.loadKw[t]! - p.generationKw[t]!;
    if (importLimitKw !== null && net > importLimitKw + powerDischargeKw) {
      return {
        field: 'loadKw',
        step: t,
        message: `at ${stepLabel(p, t)} the load minus generation (${net} kW) exceeds the import limit (${importLimitKw} kW) plus the discharge power (${powerDischargeKw} kW): no schedule can serve it; raise the import limit or check the load profile`,
      };
    }
    if (exportLimitKw !== null && -net > exportLimitKw + powerChargeKw) {
      return {
        field: 'generationKw',
        step: t,
        message: `at ${stepLabel(p, t)} the generation minus load (${-net} kW) exceeds the export limit (${exportLimitKw} kW) plus the charge power (${powerChargeKw} kW): no schedule can absorb it; raise the export limit or check the generation profile`,
      };
    }
    if (importLimitKw === null && exportLimitKw === null && p.priceExport[t]! > p.priceImport[t]!) {
      return {
        field: 'priceExport',
        step: t,
        message: `at ${stepLabel(p, t)} the export price (${p.priceExport[t]}) is above the import price (${p.priceImport[t]}) and the grid has no import or export limit, so importing to export would earn without limit; set the site's grid limits or check the prices`,
      };
    }
  }
  return null;
}

function validateEnergy(p: DispatchProblem): InputIssue | null {
  const { min, max } = energyBounds(p);
  const tol = 1e-9 * p.battery.energyKwh;
  if (!p.freeInitialEnergy && !(p.initialEnergyKwh >= min - tol && p.initialEnergyKwh <= max + tol)) {
    return {
      field: 'initialEnergyKwh',
      message: `the initial energy ${p.initialEnergyKwh} kWh is outside the SoC window ${min}–${max} kWh`,
    };
  }
  const rule = p.terminal;
  if (rule.kind === 'target' && !((p.battery.energyKwh * rule.socPct) / 100 <= max + tol)) {
    return {
      field: 'terminal',
      message: `the terminal target ${rule.socPct} % is above the SoC maximum ${p.battery.socMaxPct} %`,
    };
  }
  if (rule.kind === 'steady-value' && !Number.isFinite(rule.valuePerMwh)) {
    return { field: 'terminal', message: 'the steady-value terminal rule needs a finite stored-energy value' };
  }
  if (!(p.battery.selfDischargePctPerHour * p.stepHours < 100)) {
    return { field: 'battery.selfDischargePctPerHour', message: 'self-discharge would empty the battery within one step' };
  }
  return null;
}

export function validateProblem(p: DispatchProblem): InputIssue | null {
  return (
    validateBattery(p.battery) ??
    validateSite(p.site) ??
    validateSeries(p) ??
    validateEnergy(p) ??
    validateStepFeasibility(p) ??
    validateLimits(p, (t) => stepLabel(p, t))
  );
}
