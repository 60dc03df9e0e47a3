// Plans (delivery window + lookahead + terminal rule) and horizon studies on
// daily-periodic prices, whose turnpike is the steady cycle.
import { describe, expect, it } from 'vitest';
import { problemFor } from '../../server/engine/inputs/problem-for';
import { solvePlan } from '../../server/engine/plan/solve-plan';
import { runHorizonStudy } from '../../server/engine/study/run-horizon-study';
import { runClosedLoopParallel } from '../../server/engine/study/parallel-closed-loop';
import { runJob } from '../../server/engine/study/study-job';
import { brokenLimits } from './support/limit-check';
import { periodicInputs } from './support/periodic-inputs';

const inputs = periodicInputs(12);
const day = 24 * 3_600_000;
const t0 = inputs.timesMs[0]!;

describe('plans', () => {
  it('flags a leaving arc inside the delivery window when the free rule meets a horizon as short as the window', () => {
    // [S] Trélat & Zuazua 2015; Faulwasser & Grüne 2020 (docs/sources.md): a plan with no terminal value ends with
    // a leaving arc that empties the battery. [D] Delivery 00:00–14:00 with a 14 h horizon ends at 14:00,
    // when the steady cycle is still full, so the free plan sells early and leaves the band inside the window.
    const result = solvePlan(inputs, {
      startMs: t0 + day,
      endMs: t0 + day + 14 * 3_600_000,
      horizonHours: 14,
      terminal: { kind: 'free' },
      initialSocPct: 25,
      method: 'lp',
    });
    if (!result.ok) throw new Error(result.issue.message);
    expect(result.plan.turnpike.leavingArcSteps).toBeGreaterThan(0);
    expect(result.plan.turnpike.flags.join(' ')).toContain('leaving arc reaches into the delivery window');
  });

  it('has no leaving arc in the window with the steady-value rule, and a commit window covering the delivery day', () => {
    // [D] docs/model.md (steady-value rule): valuing end energy at the steady value removes the leaving arc;
    // a 36 h plan then agrees with a much longer plan over the 24 h delivery day.
    const result = solvePlan(inputs, {
      startMs: t0 + day,
      endMs: t0 + 2 * day,
      horizonHours: 36,
      terminal: { kind: 'steady-value' },
      initialSocPct: 25,
      method: 'lp',
    });
    if (!result.ok) throw new Error(result.issue.message);
    const { turnpike, solution, from, windowEnd, terminalRule } = result.plan;
    expect(turnpike.flags.join(' ')).not.toContain('leaving arc');
    expect(turnpike.commitWindowSteps).toBeGreaterThanOrEqual(24);
    expect(brokenLimits(problemFor(inputs, from, windowEnd, inputs.battery.energyKwh * 0.25, terminalRule), solution)).toEqual(
      [],
    );
  });

  it('refuses a horizon shorter than the delivery window, naming it', () => {
    const result = solvePlan(inputs, { startMs: t0, endMs: t0 + day, horizonHours: 12, terminal: { kind: 'free' } });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issue.message).toContain('shorter than the delivery window');
  });
});

describe('horizon study', () => {
  it('gives the same runs on worker threads as in one thread', async () => {
    // [D] Each run is a deterministic function of its inputs, wherever it runs.
    const request = {
      horizonsHours: [6, 24],
      replanHours: 2,
      terminals: [{ kind: 'free' } as const, { kind: 'steady-value' } as const],
      method: 'lp' as const,
    };
    const here = await runHorizonStudy(periodicInputs(4), { ...request, workers: 1 });
    const threads = await runHorizonStudy(periodicInputs(4), { ...request, workers: 2 });
    if (!here.ok || !threads.ok) throw new Error('study failed');
    expect(threads.study.workers).toBe(2);
    expect(threads.study.runs.map((r) => r.cost)).toEqual(here.study.runs.map((r) => r.cost));
    expect(here.study.recommendation.horizonHours).not.toBeNull();
  });
});

describe('closed loop on two cores', () => {
  it('gives the same run when a later stretch starts from a guessed state and meets the exact one', async () => {
    // [S] Turnpike property (Grüne & Guglielmi 2018; Faulwasser & Grüne 2020, docs/sources.md): receding-horizon
    // trajectories from different states meet the same regime, so a stretch started from a guess joins the
    // exact run; [D] from the meeting step on each window sees the same state and prices, so the rest matches.
    const inputs20 = periodicInputs(20);
    const job = { horizonHours: 24, horizonSteps: 24, terminal: { kind: 'free' as const } };
    const context = {
      inputs: inputs20,
      from: 0,
      to: 480,
      replanSteps: 1,
      initialEnergyKwh: 4000,
      bandFraction: 0.05,
      method: 'lp' as const,
    };
    const sequential = runJob(context, job);
    const parallel = await runClosedLoopParallel(context, job, 2);
    expect(parallel.parallel?.stretches).toBe(2);
    expect(parallel.parallel?.metAt[0]).not.toBeNull();
    expect(parallel.cost).toBeCloseTo(sequential.cost, 9);
    parallel.socKwh.forEach((e, t) => expect(e).toBeCloseTo(sequential.socKwh[t]!, 6));
  });
});
