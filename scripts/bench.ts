/**
 * `npm run bench`: speed of the dispatch engine against plain baselines built in
 * the same run, printed as one JSON document (progress on stderr). Not a test.
 *
 * Data: one invented year of hourly prices (seeded: daily and weekly shapes plus
 * noise, some negative hours), a 2-hour battery (1 MW / 2 MWh, 85 % round trip,
 * 10–90 % SoC), no site limits. Each section is an entry of SECTIONS; add one
 * (e.g. the dynamic-programming figures) by appending { name, run }.
 *
 * Timing: wall clock (performance.now) and process CPU time are both reported,
 * because the 2-core machine is often shared. Every solver first runs several
 * hundred to 1 500 small windows untimed (JIT and WebAssembly tier-up), for baselines and
 * engine alike; warmUpSeconds reports what that took.
 */
import GLPK from 'glpk.js/node';
import solver from 'javascript-lp-solver';
import { availableParallelism, cpus } from 'node:os';
import { alignInputs, type AlignedInputs } from '../server/engine/inputs/align-inputs';
import { problemFor, socPctToKwh } from '../server/engine/inputs/problem-for';
import { highs } from '../server/engine/lp/solver-runtime';
import { solve } from '../server/engine/lp/solve';
import { writeLpText } from '../server/engine/lp/lp-text';
import { buildDispatchModel } from '../server/engine/model/build-dispatch-model';
import { solveReferencePath } from '../server/engine/reference/solve-reference-path';
import { runClosedLoop } from '../server/engine/study/run-closed-loop';
import { runClosedLoopParallel } from '../server/engine/study/parallel-closed-loop';
import { runHorizonStudy } from '../server/engine/study/run-horizon-study';
import type { BatteryParams } from '../server/engine/types';
import { benchDp } from './lib/bench-dp';
import { benchCliCommand } from './lib/bench-cli';
import { closedLoopWithLimits } from './bench-limits';

const glpk = await GLPK();
const log = (message: string) => process.stderr.write(`bench: ${message}\n`);

// ---------- data ----------
const SEED = 20261201;
const STEPS = 8760;
function seededPrices(seed: number, steps: number): number[] {
  let x = seed >>> 0;
  const next = () => (x = (Math.imul(x, 1664525) + 1013904223) >>> 0) / 4294967296;
  return Array.from({ length: steps }, (_, t) => {
    const h = t % 24;
    const daily = 22 * Math.sin((2 * Math.PI * (h - 8)) / 24) + 12 * Math.sin((4 * Math.PI * h) / 24);
    const weekly = t % 168 >= 120 ? -12 : 0;
    const seasonal = 15 * Math.cos((2 * Math.PI * t) / STEPS);
    return Math.round(100 * (65 + daily + weekly + seasonal + 18 * (next() - 0.5) - (next() < 0.02 ? 90 : 0))) / 100;
  });
}
const BATTERY: BatteryParams = {
  powerChargeKw: 1000,
  powerDischargeKw: 1000,
  energyKwh: 2000,
  socMinPct: 10,
  socMaxPct: 90,
  socInitialPct: 50,
  efficiencyCharge: Math.sqrt(0.85),
  efficiencyDischarge: Math.sqrt(0.85),
  selfDischargePctPerHour: 0,
  degradationCostPerMwh: 0,
  maxCyclesPerDay: null,
};
const prices = seededPrices(SEED, STEPS);
const aligned = alignInputs({
  battery: BATTERY,
  site: { timezone: 'Europe/Berlin', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null },
  prices: { startMs: Date.UTC(2025, 11, 31, 23), stepMinutes: 60, values: prices },
});
if (!aligned.ok) throw new Error(aligned.issue.message);
const inputs: AlignedInputs = aligned.inputs;
const e0 = socPctToKwh(inputs, BATTERY.socInitialPct);

// ---------- timing ----------
interface Timed<T> {
  readonly value: T;
  readonly seconds: number;
  readonly cpuSeconds: number;
}
function timed<T>(f: () => T): Timed<T> {
  const cpu = process.cpuUsage();
  const start = performance.now();
  const value = f();
  const used = process.cpuUsage(cpu);
  return { value, seconds: (performance.now() - start) / 1000, cpuSeconds: (used.user + used.system) / 1e6 };
}
async function timedAsync<T>(f: () => Promise<T>): Promise<Timed<T>> {
  const start = performance.now();
  const cpu = process.cpuUsage();
  const value = await f();
  const used = process.cpuUsage(cpu);
  return { value, seconds: (performance.now() - start) / 1000, cpuSeconds: (used.user + used.system) / 1e6 };
}
const round = (v: number, digits = 3) => Number(v.toFixed(digits));
const ratio = (baseline: number, engine: number) => round(baseline / engine, 2);

// ---------- plain baselines: written out directly, as a straightforward loop would ----------
const { powerChargeKw: P, energyKwh: E, efficiencyCharge: etaC, efficiencyDischarge: etaD } = BATTERY;
const [eMin, eMax] = [0.1 * E, 0.9 * E];

function plainGlpkWindow(s: number, n: number, start: number) {
  const vars: { name: string; coef: number }[] = [];
  const subjectTo = [];
  const bounds = [];
  for (let t = 0; t < n; t++) {
    vars.push({ name: `c${t}`, coef: prices[s + t]! / 1000 }, { name: `d${t}`, coef: -prices[s + t]! / 1000 });
    const row = [
      { name: `e${t + 1}`, coef: 1 },
      { name: `c${t}`, coef: -etaC },
      { name: `d${t}`, coef: 1 / etaD },
    ];
    if (t > 0) row.push({ name: `e${t}`, coef: -1 });
    const rhs = t === 0 ? start : 0;
    subjectTo.push({ name: `soc${t}`, vars: row, bnds: { type: glpk.GLP_FX, lb: rhs, ub: rhs } });
    bounds.push(
      { name: `c${t}`, type: glpk.GLP_DB, lb: 0, ub: P },
      { name: `d${t}`, type: glpk.GLP_DB, lb: 0, ub: P },
      { name: `e${t + 1}`, type: glpk.GLP_DB, lb: eMin, ub: eMax },
    );
  }
  const result = glpk.solve(
    { name: 'window', objective: { direction: glpk.GLP_MIN, name: 'cost', vars }, subjectTo, bounds },
    { msglev: glpk.GLP_MSG_OFF },
  );
  return [result.result.vars.c0!, result.result.vars.d0!] as const;
}

function plainJsLpWindow(s: number, n: number, start: number) {
  const constraints: Record<string, { equal?: number; max?: number; min?: number }> = {};
  const variables: Record<string, Record<string, number>> = {};
  for (let t = 0; t < n; t++) {
    constraints[`soc${t}`] = { equal: t === 0 ? start : 0 };
    constraints[`e${t + 1}box`] = { min: eMin, max: eMax };
    constraints[`c${t}max`] = { max: P };
    constraints[`d${t}max`] = { max: P };
    variables[`c${t}`] = { cost: prices[s + t]! / 1000, [`soc${t}`]: -etaC, [`c${t}max`]: 1 };
    variables[`d${t}`] = { cost: -prices[s + t]! / 1000, [`soc${t}`]: 1 / etaD, [`d${t}max`]: 1 };
    variables[`e${t + 1}`] = { [`soc${t}`]: 1, [`e${t + 1}box`]: 1, ...(t + 1 < n ? { [`soc${t + 1}`]: -1 } : {}) };
  }
  const result = solver.Solve({ optimize: 'cost', opType: 'min', constraints, variables }) as Record<string, number>;
  return [result.c0 ?? 0, result.d0 ?? 0] as const;
}

/** Closed loop with a plain per-window solver: apply the first hour, re-plan. Returns the realised cost. */
function plainLoop(
  window: (s: number, n: number, start: number) => readonly [number, number],
  horizon: number,
  steps = STEPS,
): number {
  let e = e0;
  let cost = 0;
  for (let s = 0; s < steps; s++) {
    const [c, d] = window(s, Math.min(horizon, steps - s), e);
    e += etaC * c - d / etaD;
    cost += (prices[s]! * (c - d)) / 1000;
  }
  return cost;
}

/** Brings every solver to its steady speed first: WebAssembly tier-up takes HiGHS ~1 500 small solves. */
function warmUp(): void {
  plainLoop(plainGlpkWindow, 24, 1500);
  plainLoop(plainJsLpWindow, 24, 300);
  runClosedLoop(inputs, {
    from: 0,
    to: 1500,
    horizonSteps: 24,
    replanSteps: 1,
    terminal: { kind: 'free' },
    initialEnergyKwh: e0,
    method: 'lp',
  });
  highs.solve(writeLpText(buildDispatchModel(problemFor(inputs, 0, 500, e0, { kind: 'free' })).lp), { output_flag: false });
}

// ---------- sections ----------
interface Section {
  readonly name: string;
  readonly run: () => unknown;
}

/** CPU ms per solve by backend and window length: warm-up, then the best of three rounds. */
function backendCrossover() {
  return [6, 12, 24, 48, 96, 168, 720].map((steps) => {
    const count = Math.max(10, Math.floor(2000 / steps));
    const models = Array.from({ length: count }, (_, k) => {
      const from = (k * 37) % (STEPS - steps);
      return buildDispatchModel(problemFor(inputs, from, from + steps, e0, { kind: 'free' })).lp;
    });
    const best = (backend: 'glpk' | 'highs') => {
      models.slice(0, 10).forEach((m) => solve(m, { backend }));
      const rounds = [0, 1, 2].map(() => timed(() => models.forEach((m) => solve(m, { backend }))).cpuSeconds);
      return round((Math.min(...rounds) * 1000) / count, 3);
    };
    return {
      steps,
      modelSize: models[0]!.values.length + models[0]!.numCols,
      glpkCpuMsPerSolve: best('glpk'),
      highsCpuMsPerSolve: best('highs'),
    };
  });
}

function referencePath() {
  const model = buildDispatchModel(problemFor(inputs, 0, STEPS, e0, { kind: 'free' })).lp;
  const text = timed(() => writeLpText(model));
  const [directRun, engineRun] = bestOfTwo<unknown>([
    () => highs.solve(text.value, { output_flag: false }),
    () => solveReferencePath(inputs, { terminal: { kind: 'free' }, method: 'lp' }),
  ]);
  const direct = directRun as Timed<ReturnType<typeof highs.solve>>;
  const engine = engineRun as Timed<ReturnType<typeof solveReferencePath>>;
  if (!engine.value.ok) throw new Error(engine.value.issue.message);
  const solution = engine.value.path.solution;
  return {
    engineSeconds: round(engine.seconds),
    engineCpuSeconds: round(engine.cpuSeconds),
    engineBackend: solution.backend,
    tieBreakSolve: solution.tieBroken,
    directHighsLpTextSeconds: round(direct.seconds),
    directHighsCpuSeconds: round(direct.cpuSeconds),
    lpTextBuildSeconds: round(text.seconds),
    speedupVsDirectHighs: ratio(direct.cpuSeconds, engine.cpuSeconds),
    engineObjective: solution.objective,
    directObjective: direct.value.ObjectiveValue,
  };
}

/** Best of two alternating rounds (wall and CPU each), so no method is always the one measured first. */
function bestOfTwo<T>(runs: (() => T)[]): Timed<T>[] {
  const results: Timed<T>[][] = runs.map(() => []);
  for (let round = 0; round < 2; round++) runs.forEach((run, i) => results[i]!.push(timed(run)));
  return results.map(([a, b]) => ({
    value: a!.value,
    seconds: Math.min(a!.seconds, b!.seconds),
    cpuSeconds: Math.min(a!.cpuSeconds, b!.cpuSeconds),
  }));
}

async function closedLoop24h() {
  const [engine, glpkLoop] = bestOfTwo<{ cost: number; solves?: number }>([
    () =>
      runClosedLoop(inputs, {
        from: 0,
        to: STEPS,
        horizonSteps: 24,
        replanSteps: 1,
        terminal: { kind: 'free' },
        initialEnergyKwh: e0,
        method: 'lp',
      }),
    () => ({ cost: plainLoop(plainGlpkWindow, 24) }),
  ]) as [Timed<{ cost: number; solves?: number }>, Timed<{ cost: number }>];
  const jsLpLoop = timed(() => plainLoop(plainJsLpWindow, 24));
  const context = { inputs, from: 0, to: STEPS, replanSteps: 1, initialEnergyKwh: e0, bandFraction: 0.05, method: 'lp' as const };
  const parallel = await timedAsync(() =>
    runClosedLoopParallel(context, { horizonHours: 24, horizonSteps: 24, terminal: { kind: 'free' } }, 2),
  );
  return {
    solves: engine.value.solves,
    method: 'engine and plain GLPK loop: best of two alternating rounds',
    engine: { seconds: round(engine.seconds), cpuSeconds: round(engine.cpuSeconds), cost: engine.value.cost },
    engineTwoCores: {
      seconds: round(parallel.seconds),
      cpuSecondsAllThreads: round(parallel.cpuSeconds),
      cost: parallel.value.cost,
      parallel: parallel.value.parallel,
    },
    plainGlpkLoop: { seconds: round(glpkLoop.seconds), cpuSeconds: round(glpkLoop.cpuSeconds), cost: glpkLoop.value.cost },
    plainJsLpSolverLoop: { seconds: round(jsLpLoop.seconds), cpuSeconds: round(jsLpLoop.cpuSeconds), cost: jsLpLoop.value },
    speedupVsGlpk: {
      wall: ratio(glpkLoop.seconds, engine.seconds),
      cpu: ratio(glpkLoop.cpuSeconds, engine.cpuSeconds),
      twoCoresWall: ratio(glpkLoop.seconds, parallel.seconds),
    },
    speedupVsJsLpSolver: {
      wall: ratio(jsLpLoop.seconds, engine.seconds),
      cpu: ratio(jsLpLoop.cpuSeconds, engine.cpuSeconds),
      twoCoresWall: ratio(jsLpLoop.seconds, parallel.seconds),
    },
  };
}

async function sixHorizonStudy() {
  const study = await timedAsync(() =>
    runHorizonStudy(inputs, {
      horizonsHours: [6, 12, 24, 48, 96, 168],
      replanHours: 1,
      terminals: [{ kind: 'free' }, { kind: 'steady-value' }],
      method: 'lp',
      onProgress: (done, total) => log(`six-horizon study: ${done}/${total} runs`),
    }),
  );
  if (!study.value.ok) throw new Error(study.value.issue.message);
  const s = study.value.study;
  return {
    seconds: round(study.seconds),
    workers: s.workers,
    referenceCost: s.referenceCost,
    recommendation: s.recommendation,
    runs: s.runs.map((r) => ({
      horizonHours: r.horizonHours,
      terminal: r.terminal,
      seconds: round(r.seconds),
      gapPct: round(r.gapPct, 4),
      solves: r.solves,
    })),
  };
}

/**
 * The exact dynamic program (CPU ms) against this file's plain GLPK
 * window in the same run; the six-horizon study, and the whole `cli study`
 * command on the sample data (target ≤ 3 s, process start included).
 */
async function dynamicProgram() {
  const figures = benchDp({
    problem: problemFor(inputs, 0, STEPS, e0, { kind: 'free' }),
    glpkWindow: (s, n, start) => {
      const [c, d] = plainGlpkWindow(s, n, start);
      return start + etaC * c - d / etaD;
    },
  });
  const horizonsHours = [6, 12, 24, 48, 96, 168];
  const terminals = [{ kind: 'free' }, { kind: 'steady-value' }] as const;
  const study = await timedAsync(() =>
    runHorizonStudy(inputs, { horizonsHours, replanHours: 1, terminals: [...terminals], method: 'auto' }),
  );
  if (!study.value.ok) throw new Error(study.value.issue.message);
  log('cli study on the sample data (npm run cli, bundle and tsx sources)…');
  const cli = benchCliCommand(
    [
      'study',
      '--prices',
      'sample-data/prices-2026-hourly.csv',
      '--battery',
      'sample-data/demo-battery.json',
      '--site',
      'sample-data/demo-site.json',
      '--horizons',
      horizonsHours.join(','),
      '--replan',
      '1',
      '--terminal',
      'free,steady-value',
    ],
    3,
  );
  return {
    ...figures,
    sixHorizonStudyOnDp: {
      seconds: round(study.seconds),
      cpuSeconds: round(study.cpuSeconds),
      workers: study.value.study.workers,
    },
    cliStudyOnSampleData: cli,
  };
}

const SECTIONS: Section[] = [
  { name: 'backendCrossover', run: backendCrossover },
  { name: 'referencePath', run: referencePath },
  { name: 'closedLoop24h', run: closedLoop24h },
  { name: 'sixHorizonStudy', run: sixHorizonStudy },
  { name: 'dynamicProgram', run: dynamicProgram },
  {
    name: 'closedLoopWithLimits',
    run: () => closedLoopWithLimits({ glpk, battery: BATTERY, prices, startMs: Date.UTC(2025, 11, 31, 23), timed }),
  },
];

const only = process.argv.slice(2);
const report: Record<string, unknown> = {
  machine: { cpus: availableParallelism(), model: cpus()[0]?.model ?? 'unknown', node: process.version },
  data: {
    seed: SEED,
    steps: STEPS,
    battery: '1 MW / 2 MWh, 85 % round trip, SoC 10–90 %',
    priceRange: [Math.min(...prices), Math.max(...prices)],
  },
};
const warm = timed(warmUp);
report.warmUpSeconds = round(warm.seconds);
for (const section of SECTIONS) {
  if (only.length > 0 && !only.includes(section.name)) continue;
  log(`${section.name}…`);
  report[section.name] = await section.run();
}
process.stdout.write(`${JSON.stringify(report, null, 2)}\n`);
