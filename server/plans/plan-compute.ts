/**
 * The plan computation, run in a worker thread: pure engine work on the
 * inputs snapshot and the profile values, no database. Returns the results to
 * store, or the engine's message when the model cannot be solved.
 */
import type { PlanInputs, PlanResults, PlanStep } from '@shared/schemas/plan';
import {
  alignInputs,
  parseTerminal,
  solvePlan,
  steadySocAt,
  steadyValueAt,
  type AlignedInputs,
  type ProfileSeries,
} from '../engine';
import { summarisePlan } from './plan-summary';
import { turnpikeSentence } from './plan-words';

export interface PlanComputeInput {
  inputs: PlanInputs;
  price: ProfileSeries;
  load: ProfileSeries | null;
  generation: ProfileSeries | null;
}

export type ComputeOutcome<R> = { ok: true; results: R } | { ok: false; message: string };

/** The snapshot's battery and site with the profile values, on one grid (the engine's alignment). */
export function alignSnapshot(
  snapshot: { battery: PlanInputs['battery']; site: PlanInputs['site'] },
  series: { price: ProfileSeries; load: ProfileSeries | null; generation: ProfileSeries | null },
) {
  return alignInputs({
    battery: snapshot.battery,
    site: snapshot.site,
    prices: series.price,
    ...(series.load ? { load: series.load } : {}),
    ...(series.generation ? { generation: series.generation } : {}),
  });
}

type Report = (shareDone: number, message: string | null) => void;

/** Local clock minute at the boundary before step `index` (the grid's end counts as a boundary). */
function minuteOfDayAt(a: AlignedInputs, index: number): number {
  const minutes = a.clock.minuteOfDay;
  return index < minutes.length ? minutes[index]! : (minutes[minutes.length - 1]! + a.stepMinutes) % 1440;
}

/** Value curves kept per plan: a week of hourly curves would swell every read of the plan. */
const MAX_VALUE_CURVES = 25;

function evenlySpaced<T>(items: readonly T[], max: number): T[] {
  if (items.length <= max) return [...items];
  const every = Math.ceil(items.length / max);
  return items.filter((_, i) => i % every === 0);
}

const finiteOrNull = (v: number | undefined) => (v !== undefined && Number.isFinite(v) ? v : null);

export async function computePlan(input: PlanComputeInput, report: Report): Promise<ComputeOutcome<PlanResults>> {
  const started = performance.now();
  const { inputs } = input;
  const aligned = alignSnapshot(inputs, input);
  if (!aligned.ok) return { ok: false, message: aligned.issue.message };
  const terminal = parseTerminal(inputs.terminalRule);
  if (!terminal.ok) return { ok: false, message: terminal.message };
  report(0.1, 'Solving the steady cycle and the plan.');

  const outcome = solvePlan(aligned.inputs, {
    startMs: Date.parse(inputs.deliveryStart),
    endMs: Date.parse(inputs.deliveryEnd),
    horizonHours: inputs.horizonHours,
    terminal: terminal.choice,
    initialSocPct: inputs.initialSocPct,
    bandFraction: inputs.bandPct / 100,
    steadyDays: inputs.steadyDays ?? 'all',
  });
  if (!outcome.ok) return { ok: false, message: outcome.issue.message };
  report(0.9, 'Writing up the turnpike figures.');

  const a = aligned.inputs;
  const { plan } = outcome;
  const sol = plan.solution;
  const tp = plan.turnpike;
  const n = sol.chargeKw.length;
  const deliverySteps = plan.to - plan.from;
  const steps: PlanStep[] = [];
  for (let t = 0; t < n; t++) {
    const g = plan.from + t;
    const minute = minuteOfDayAt(a, g + 1);
    const socKwh = sol.socKwh[t + 1]!;
    const distance = finiteOrNull(tp.distance[t]);
    const arc =
      t < tp.entryArcSteps
        ? 'entry'
        : t >= n - tp.leavingArcSteps
          ? 'leaving'
          : distance !== null && distance <= tp.band
            ? 'near'
            : 'outside';
    steps.push({
      time: new Date(a.timesMs[g]!).toISOString(),
      delivery: t < deliverySteps,
      priceImport: a.priceImport[g]!,
      priceExport: a.priceExport[g]!,
      chargeKw: sol.chargeKw[t]!,
      dischargeKw: sol.dischargeKw[t]!,
      gridImportKw: sol.gridImportKw[t]!,
      gridExportKw: sol.gridExportKw[t]!,
      socKwh,
      socPct: (socKwh / inputs.battery.energyKwh) * 100,
      storedEnergyValue: finiteOrNull(sol.storedEnergyValue[t]),
      steadySocKwh: finiteOrNull(steadySocAt(plan.steady, minute)),
      steadyValue: finiteOrNull(steadyValueAt(plan.steady, minute)),
      distance,
      arc,
    });
  }
  // The engine compares with a lookahead of max(4·H, H + 168 h), cut where the data end.
  const longerSteps = Math.floor((Math.max(4 * inputs.horizonHours, inputs.horizonHours + 168) * 60) / a.stepMinutes);
  const longerLookaheadHours =
    tp.commitWindowSteps === null
      ? null
      : ((Math.min(a.timesMs.length, plan.from + longerSteps) - plan.from) * a.stepMinutes) / 60;
  const turnpike = {
    bandPct: inputs.bandPct,
    bandKwh: tp.bandKwh,
    nearSteadyShare: tp.nearSteadyShare,
    entryArcSteps: tp.entryArcSteps,
    leavingArcSteps: tp.leavingArcSteps,
    commitWindowSteps: tp.commitWindowSteps,
    longerLookaheadHours,
    value: {
      bandPerMwh: tp.value.band,
      nearSteadyShare: tp.value.nearSteadyShare,
      entryArcSteps: tp.value.entryArcSteps,
      leavingArcSteps: tp.value.leavingArcSteps,
      commitWindowSteps: tp.value.commitWindowSteps,
    },
    flags: [...tp.flags],
  };
  return {
    ok: true,
    results: {
      method: sol.method,
      stepMinutes: a.stepMinutes,
      deliverySteps,
      steps,
      summary: summarisePlan(a, plan.from, deliverySteps, sol),
      turnpike: { ...turnpike, summary: turnpikeSentence(turnpike, a.stepMinutes, inputs.terminalRule) },
      steadyCycle: { costPerDay: plan.steady.costPerDay, equivalentCyclesPerDay: plan.steady.equivalentCyclesPerDay },
      decisionHorizonHours: plan.dpInsights?.decisionHorizonHours ?? null,
      valueCurves: evenlySpaced(plan.dpInsights?.valueCurves ?? [], MAX_VALUE_CURVES).map((c) => ({
        time: c.time,
        points: [...c.points],
      })),
      notes: [
        ...a.notes,
        ...plan.steady.notes,
        ...(plan.dpInsights?.limitedByData
          ? ['The decision horizon reaches the end of the lookahead: prices beyond it might still change the delivery decisions.']
          : []),
      ],
      solveSeconds: (performance.now() - started) / 1000,
    },
  };
}
