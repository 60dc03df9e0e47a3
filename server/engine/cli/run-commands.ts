/**
 * The four commands of the command line (its contract). Each returns the
 * JSON document for stdout or throws CliInputError for bad input.
 */
import { batteryWarningMessages } from '@shared/schemas/battery-warnings';
import type { AlignedInputs } from '../inputs/align-inputs';
import { stepIndexOf } from '../inputs/problem-for';
import { solveSteadyCycle } from '../steady/solve-steady-cycle';
import type { DaySelection } from '../steady/representative-day';
import { solveReferencePath } from '../reference/solve-reference-path';
import { summarizePath } from '../reference/path-summary';
import { solvePlan } from '../plan/solve-plan';
import { runHorizonStudy } from '../study/run-horizon-study';
import { parseTerminal, terminalLabel, type TerminalChoice } from '../terminal/terminal-choice';
import { steadyCyclingCheck } from '../plan/cycling-check';
import type { NetFigures } from '../value/net-figures';
import { planWordsFigures, turnpikeWords } from '../turnpike/turnpike-words';
import { CliInputError, listOption, numberOption, required, type ParsedArgs } from './cli-args';
import { parseInstant } from './read-inputs';
import { initialPower } from './read-limit-inputs';
import { limitOutput, limitWarnings } from './limit-output';

export const CAUTION =
  "Decision support only: check the schedule against the interconnection agreement, the applicable grid code and the system operator's instructions, the battery maker's operating limits and the site's fire and safety requirements; qualified personnel decide dispatch.";

type Method = 'auto' | 'lp' | 'dp';

function method(args: ParsedArgs): Method {
  const value = args.options.get('method') ?? 'auto';
  if (value !== 'auto' && value !== 'lp' && value !== 'dp') throw new CliInputError(`--method ${value}: expected auto, lp or dp`);
  return value;
}

function terminal(text: string): TerminalChoice {
  const parsed = parseTerminal(text);
  if (!parsed.ok) throw new CliInputError(parsed.message);
  return parsed.choice;
}

function index(inputs: AlignedInputs, args: ParsedArgs, name: 'start' | 'end'): number | undefined {
  const text = args.options.get(name);
  if (text === undefined) return undefined;
  const found = stepIndexOf(inputs, parseInstant(text, inputs.site.timezone, `--${name}`), `--${name}`);
  if (!found.ok) throw new CliInputError(found.message);
  return found.index;
}

function initialSoc(args: ParsedArgs): number | undefined {
  return numberOption(args, 'initial-soc', (v) => v >= 0 && v <= 100, 'a percentage between 0 and 100');
}

/** --days: which local days the steady cycle averages. */
function steadyDays(args: ParsedArgs): DaySelection {
  const days = args.options.get('days') ?? 'all';
  if (days !== 'all' && days !== 'weekday' && days !== 'weekend')
    throw new CliInputError(`--days ${days}: expected all, weekday or weekend`);
  return days;
}

/** The net-figure keys of a plan or path (DESIGN section 3.1), beside its cash `cost`. */
function netKeys(net: NetFigures) {
  return {
    storedEnergyChange: net.storedEnergyChange,
    netCost: net.netCost,
    noBatteryCost: net.noBatteryCost,
    batteryValue: net.batteryValue,
    storedEnergyValuation: net.storedEnergyValuation,
  };
}

export function steadyCommand(inputs: AlignedInputs, args: ParsedArgs) {
  const days = steadyDays(args);
  const result = solveSteadyCycle(inputs, { days });
  if (!result.ok) throw new CliInputError(`${result.issue.field}: ${result.issue.message}`);
  const c = result.cycle;
  if (c.status !== 'optimal') throw new CliInputError(`the steady cycle could not be solved: ${c.message}`);
  const cycling = steadyCyclingCheck(inputs.battery, c.equivalentCyclesPerDay);
  return {
    method: 'lp',
    cost: c.costPerDay,
    equivalentCycles: c.equivalentCyclesPerDay,
    socStartKwh: c.socStartKwh,
    slotMinutes: c.slotMinutes,
    days: c.days,
    dstDays: c.dstDays,
    notes: c.notes,
    warnings: [...batteryWarningMessages(inputs.battery, inputs.site), ...(cycling.message ? [cycling.message] : [])],
    cycling,
    slots: c.slots.map(({ time, chargeKw, dischargeKw, socKwh, storedEnergyValue, storedEnergyValueRange, priceImport }) => ({
      time,
      priceImport,
      chargeKw,
      dischargeKw,
      socKwh,
      storedEnergyValue,
      storedEnergyValueRange,
    })),
  };
}

export function referenceCommand(inputs: AlignedInputs, args: ParsedArgs) {
  const from = index(inputs, args, 'start');
  const to = index(inputs, args, 'end');
  const soc = initialSoc(args);
  const choice = terminal(args.options.get('terminal') ?? 'free');
  const power = initialPower(args);
  const result = solveReferencePath(inputs, {
    ...(from !== undefined ? { from } : {}),
    ...(to !== undefined ? { to } : {}),
    ...(soc !== undefined ? { initialSocPct: soc } : {}),
    ...(power !== undefined ? { initialNetPowerKw: power } : {}),
    terminal: choice,
    steadyDays: steadyDays(args),
    method: method(args),
  });
  if (!result.ok) throw new CliInputError(`${result.issue.field}: ${result.issue.message}`);
  const { solution, from: start, to: end, terminalRule, netFigures } = result.path;
  if (solution.status !== 'optimal' || !netFigures)
    throw new CliInputError(solution.message ?? `the reference path is ${solution.status}`);
  return {
    method: solution.method,
    terminal: terminalLabel(choice),
    ...summarizePath(inputs, solution, start),
    ...netKeys(netFigures),
    simultaneousSteps: solution.simultaneousSteps ?? [],
    warnings: [...batteryWarningMessages(inputs.battery, inputs.site), ...limitWarnings(inputs)],
    ...limitOutput(inputs, {
      from: start,
      to: end,
      windowEnd: end,
      terminalRule,
      solution,
      method: method(args),
      ...(power !== undefined ? { initialNetPowerKw: power } : {}),
    }),
  };
}

export function planCommand(inputs: AlignedInputs, args: ParsedArgs) {
  const tz = inputs.site.timezone;
  const horizon = numberOption(args, 'horizon', (v) => v > 0, 'a positive number of hours');
  if (horizon === undefined) required(args, 'horizon');
  const band = numberOption(args, 'band', (v) => v > 0 && v < 100, 'a band in % of usable energy, e.g. 5');
  const soc = initialSoc(args);
  const days = steadyDays(args);
  const power = initialPower(args);
  const rule = terminal(required(args, 'terminal'));
  const result = solvePlan(inputs, {
    ...(power !== undefined ? { initialNetPowerKw: power } : {}),
    startMs: parseInstant(required(args, 'start'), tz, '--start'),
    endMs: parseInstant(required(args, 'end'), tz, '--end'),
    horizonHours: horizon!,
    terminal: rule,
    ...(soc !== undefined ? { initialSocPct: soc } : {}),
    ...(band !== undefined ? { bandFraction: band / 100 } : {}),
    steadyDays: days,
    method: method(args),
  });
  if (!result.ok) throw new CliInputError(`${result.issue.field}: ${result.issue.message}`);
  const { plan } = result;
  const delivery = plan.to - plan.from;
  const { distance: _d, value, ...figures } = plan.turnpike;
  const { distance: _v, ...valueFigures } = value;
  return {
    method: plan.solution.method,
    ...summarizePath(inputs, plan.solution, plan.from, 0, delivery),
    ...netKeys(plan.netFigures),
    cycling: plan.cycling,
    lookahead: { hours: plan.lookaheadHours, ...summarizePath(inputs, plan.solution, plan.from, delivery) },
    terminal: plan.terminalRule,
    steadyCycle: { days, daysAveraged: plan.steady.days, cost: plan.steady.costPerDay, notes: plan.steady.notes },
    turnpike: {
      ...figures,
      value: valueFigures,
      longerLookaheadHours: plan.longerLookaheadHours,
      summary: turnpikeWords(planWordsFigures(plan), inputs.stepMinutes, terminalLabel(rule)),
    },
    decisionHorizonHours: plan.dpInsights?.decisionHorizonHours ?? null,
    valueCurves: plan.dpInsights?.valueCurves ?? [],
    warnings: [...plan.warnings, ...limitWarnings(inputs)],
    caution: CAUTION,
    ...limitOutput(inputs, {
      from: plan.from,
      to: plan.to,
      windowEnd: plan.windowEnd,
      terminalRule: plan.terminalRule,
      solution: plan.solution,
      method: method(args),
      ...(power !== undefined ? { initialNetPowerKw: power } : {}),
    }),
  };
}

export async function studyCommand(inputs: AlignedInputs, args: ParsedArgs, progress: (message: string) => void) {
  const from = index(inputs, args, 'start');
  const to = index(inputs, args, 'end');
  const horizons = listOption(args, 'horizons').map((h) => {
    const v = Number(h);
    if (!(v > 0)) throw new CliInputError(`--horizons: "${h}" is not a positive number of hours`);
    return v;
  });
  const replan = numberOption(args, 'replan', (v) => v > 0, 'a positive number of hours');
  if (replan === undefined) required(args, 'replan');
  const gapTarget = numberOption(args, 'gap-target', (v) => v >= 0, 'a gap target in %, e.g. 0.5');
  const band = numberOption(args, 'band', (v) => v > 0 && v < 100, 'a band in % of usable energy, e.g. 5');
  const workers = numberOption(args, 'workers', (v) => Number.isInteger(v) && v >= 0, 'a whole number of worker threads');
  const soc = initialSoc(args);
  const result = await runHorizonStudy(inputs, {
    ...(from !== undefined ? { startMs: inputs.timesMs[from]! } : {}),
    ...(to !== undefined ? { endMs: inputs.timesMs[0]! + to * inputs.stepMinutes * 60_000 } : {}),
    horizonsHours: horizons,
    replanHours: replan!,
    terminals: listOption(args, 'terminal').map(terminal),
    ...(soc !== undefined ? { initialSocPct: soc } : {}),
    ...(gapTarget !== undefined ? { gapTargetPct: gapTarget } : {}),
    ...(band !== undefined ? { bandFraction: band / 100 } : {}),
    ...(workers !== undefined ? { workers } : {}),
    steadyDays: steadyDays(args),
    method: method(args),
    onProgress: (done, total) => progress(`study: ${done}/${total} runs done`),
  });
  if (!result.ok) throw new CliInputError(`${result.issue.field}: ${result.issue.message}`);
  const { study } = result;
  const failed = study.runs.find((r) => r.status !== 'optimal');
  if (failed)
    throw new CliInputError(
      `the run H = ${failed.horizonHours} h, ${failed.terminal} failed: ${failed.message ?? failed.status}`,
    );
  return {
    referenceCost: study.referenceCost,
    referenceNetCost: study.referenceNetCost,
    referenceBatteryValue: study.referenceBatteryValue,
    noBatteryCost: study.noBatteryCost,
    storedEnergyValuation: study.storedEnergyValuation,
    runs: study.runs.map((r) => ({
      horizonHours: r.horizonHours,
      terminal: r.terminal,
      method: r.method,
      cost: r.cost,
      gapPct: r.gapPct,
      storedEnergyChange: r.storedEnergyChange,
      netCost: r.netCost,
      noBatteryCost: r.noBatteryCost,
      batteryValue: r.batteryValue,
      gapValue: r.gapValue,
      valueGapPct: r.valueGapPct,
      endSocKwh: r.endEnergyKwh,
      cycling: r.cycling,
      equivalentCycles: r.equivalentCycles,
      solves: r.solves,
      seconds: r.seconds,
      nearSteadyShare: r.nearSteadyShare,
      meanLeavingArcSteps: r.meanLeavingArcSteps,
      leavingIntoCommittedPlans: r.leavingIntoCommitted,
    })),
    recommendation: study.recommendation,
    seconds: study.seconds,
    workers: study.workers,
  };
}
