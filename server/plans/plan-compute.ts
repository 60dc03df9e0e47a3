/**
 * The plan computation, run in a worker thread: pure engine work on the
 * inputs snapshot and the profile values, no database. Returns the results to
 * store, or the engine's message when the model cannot be solved. The figures
 * beside the schedule come from ./insights/.
 */
import type { PlanResults, PlanStep } from '@shared/schemas/plan';
import { parseTerminal, solvePlan, steadySocAt, steadyValueAt, type AlignedInputs } from '../engine';
import { alignSnapshot } from '../runs/align-snapshot';
import type { ComputeOutcome, ReportProgress } from '../runs/run-task';
import { exactPathInsights } from './insights/exact-path-insights';
import { summarisePlan } from './insights/plan-summary';
import { netMoney } from '../runs/net-money';
import { turnpikeInsight } from './insights/turnpike-insight';
import type { PlanComputeInput } from './plan-task';

/** Local clock minute at the boundary before step `index` (the grid's end counts as a boundary). */
function minuteOfDayAt(a: AlignedInputs, index: number): number {
  const minutes = a.clock.minuteOfDay;
  return index < minutes.length ? minutes[index]! : (minutes[minutes.length - 1]! + a.stepMinutes) % 1440;
}

const finiteOrNull = (v: number | undefined) => (v !== undefined && Number.isFinite(v) ? v : null);

export async function computePlan(input: PlanComputeInput, report: ReportProgress): Promise<ComputeOutcome<PlanResults>> {
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
  const insights = exactPathInsights(plan);
  return {
    ok: true,
    results: {
      method: sol.method,
      stepMinutes: a.stepMinutes,
      deliverySteps,
      steps,
      summary: { ...summarisePlan(a, plan.from, deliverySteps, sol), ...netMoney(plan.netFigures) },
      turnpike: turnpikeInsight(plan, inputs.bandPct, a.stepMinutes, inputs.terminalRule),
      steadyCycle: { costPerDay: plan.steady.costPerDay, equivalentCyclesPerDay: plan.steady.equivalentCyclesPerDay },
      decisionHorizonHours: insights.decisionHorizonHours,
      valueCurves: insights.valueCurves,
      notes: [...a.notes, ...plan.steady.notes, ...insights.notes],
      solveSeconds: (performance.now() - started) / 1000,
    },
  };
}
