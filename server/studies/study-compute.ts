/**
 * The horizon-study computation, run in a worker thread: the engine's
 * closed-loop runs for every horizon and terminal rule against the reference
 * path, with progress after each run. Pure: no database.
 */
import type { StudyResults } from '@shared/schemas/study';
import { DEFAULT_GAP_TARGET_PCT, parseTerminal, runHorizonStudy, type TerminalChoice } from '../engine';
import { alignSnapshot } from '../runs/align-snapshot';
import type { ComputeOutcome, ReportProgress } from '../runs/run-task';
import { valuationOf } from '../runs/net-money';
import type { StudyComputeInput } from './study-task';

export async function computeStudy(input: StudyComputeInput, report: ReportProgress): Promise<ComputeOutcome<StudyResults>> {
  const { inputs } = input;
  const aligned = alignSnapshot(inputs, input);
  if (!aligned.ok) return { ok: false, message: aligned.issue.message };
  const terminals: TerminalChoice[] = [];
  for (const text of inputs.terminalRules) {
    const parsed = parseTerminal(text);
    if (!parsed.ok) return { ok: false, message: parsed.message };
    terminals.push(parsed.choice);
  }
  const total = inputs.horizonsHours.length * terminals.length;
  report(0.02, `Solving the reference path, then ${total} closed-loop run${total === 1 ? '' : 's'}.`);
  const outcome = await runHorizonStudy(aligned.inputs, {
    startMs: Date.parse(inputs.start),
    endMs: Date.parse(inputs.end),
    horizonsHours: inputs.horizonsHours,
    replanHours: inputs.replanHours,
    terminals,
    initialSocPct: inputs.initialSocPct,
    bandFraction: inputs.bandPct / 100,
    steadyDays: inputs.steadyDays ?? 'all',
    workers: input.threads,
    onProgress: (done, all) => report(0.1 + (0.88 * done) / all, `${done} of ${all} runs finished.`),
  });
  if (!outcome.ok) return { ok: false, message: outcome.issue.message };
  const { study } = outcome;
  const finished = study.runs.filter((r) => r.status === 'optimal');
  if (finished.length === 0) {
    return { ok: false, message: study.runs[0]?.message ?? 'no closed-loop run could be solved' };
  }
  const methods = new Set(study.runs.map((r) => r.method));
  const a = aligned.inputs;
  const finite = (v: number) => (Number.isFinite(v) ? v : 0);
  const finiteOrNull = (v: number) => (Number.isFinite(v) ? v : null);
  return {
    ok: true,
    results: {
      method: methods.size === 1 ? [...methods][0]! : 'mixed',
      referenceCost: study.referenceCost,
      referenceNetCost: study.referenceNetCost,
      referenceBatteryValue: study.referenceBatteryValue,
      noBatteryCost: study.noBatteryCost,
      storedEnergyValuation: valuationOf(study.storedEnergyValuation),
      referenceEquivalentCycles: study.referenceEquivalentCycles,
      steps: Math.round((Date.parse(inputs.end) - Date.parse(inputs.start)) / (a.stepMinutes * 60_000)),
      stepMinutes: a.stepMinutes,
      runs: study.runs.map((r) => ({
        horizonHours: r.horizonHours,
        terminal: r.terminal,
        status: r.status,
        message: r.message ?? null,
        cost: finiteOrNull(r.cost),
        gapPct: finiteOrNull(r.gapPct),
        equivalentCycles: finite(r.equivalentCycles),
        solves: r.solves,
        seconds: r.seconds,
        nearSteadyShare: finite(r.nearSteadyShare),
        meanLeavingArcSteps: finite(r.meanLeavingArcSteps),
        leavingIntoCommitted: r.leavingIntoCommitted,
        method: r.method,
        storedEnergyChange: finiteOrNull(r.storedEnergyChange),
        netCost: finiteOrNull(r.netCost),
        noBatteryCost: finiteOrNull(r.noBatteryCost),
        batteryValue: finiteOrNull(r.batteryValue),
        gapValue: finiteOrNull(r.gapValue),
        valueGapPct: finiteOrNull(r.valueGapPct),
      })),
      recommendation: study.recommendation,
      targetGapPct: DEFAULT_GAP_TARGET_PCT,
      notes: [...a.notes],
      seconds: study.seconds,
    },
  };
}
