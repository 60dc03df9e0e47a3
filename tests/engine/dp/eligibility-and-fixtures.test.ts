import { describe, expect, it } from 'vitest';
import { canSolveWithDp, solveDispatchDp } from '../../../server/engine/dp';
import type { DispatchProblem } from '../../../server/engine/types';
import { solveWithGlpk } from '../../support/reference-lp';
import { battery, problem as fixtureProblem } from '../support/problem-builder';

/** A 1 MW / 1 MWh battery at 0.9 each way, starting empty, on hourly prices from 2 March 2026 (UTC). */
function problem(
  prices: number[],
  over: Partial<DispatchProblem> = {},
  b: Partial<DispatchProblem['battery']> = {},
): DispatchProblem {
  return {
    ...fixtureProblem(prices, { battery: battery({ efficiencyCharge: 0.9, efficiencyDischarge: 0.9, ...b }) }),
    timesMs: prices.map((_, t) => Date.UTC(2026, 2, 2) + t * 3_600_000),
    initialEnergyKwh: 0,
    ...over,
  };
}

describe('models the dynamic program cannot take', () => {
  it('refuses a demand charge, naming it', () => {
    const p = problem([20, 100], { site: { timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: 10 } });
    const check = canSolveWithDp(p);
    expect(check.ok).toBe(false);
    expect(!check.ok && check.reason).toMatch(/demand charge/);
    expect(solveDispatchDp(p).status).toBe('error');
  });

  it('refuses a daily throughput cap, naming it', () => {
    const check = canSolveWithDp(problem([20, 100], {}, { maxCyclesPerDay: 1 }));
    expect(!check.ok && check.reason).toMatch(/throughput cap \(1 cycles per day\)/);
  });

  it('refuses an export price above the import price, naming the step', () => {
    const check = canSolveWithDp(problem([20, 100, 50], { priceExport: [20, 100, 51] }));
    expect(!check.ok && check.reason).toMatch(
      /export price 51 is above the import price 50 at step 2 \(2026-03-02T02:00:00.000Z\)/,
    );
  });

  it('refuses a free initial SoC (the steady cycle), which the LP solves', () => {
    const check = canSolveWithDp(problem([20, 100], { freeInitialEnergy: true, terminal: { kind: 'cyclic' } }));
    expect(!check.ok && check.reason).toMatch(/free initial SoC/);
  });

  it('takes site load, generation, grid limits, self-discharge and every terminal rule', () => {
    const p = problem(
      [20, 100],
      {
        loadKw: [300, 200],
        generationKw: [0, 500],
        priceExport: [10, 90],
        site: { timezone: 'UTC', importLimitKw: 2000, exportLimitKw: 800, demandChargePerKw: null },
        terminal: { kind: 'steady-value', valuePerMwh: 40 },
      },
      { selfDischargePctPerHour: 0.1, degradationCostPerMwh: 5 },
    );
    expect(canSolveWithDp(p)).toEqual({ ok: true });
  });

  it('rejects bad inputs with what, where and how to fix', () => {
    expect(solveDispatchDp(problem([20, NaN])).message).toMatch(/priceImport\[1\] is not a finite number/);
    expect(solveDispatchDp(problem([20, 30], {}, { efficiencyCharge: 1.2 })).message).toMatch(
      /efficiencyCharge must be in \(0, 1\], got 1.2/,
    );
    expect(solveDispatchDp(problem([20, 30], {}, { socMinPct: 80, socMaxPct: 20 })).message).toMatch(
      /SoC window 80–20 % is empty/,
    );
  });
});

describe('worked fixtures', () => {
  // [D] worked fixture A: charge 1 MW at 20, hold 0.9 MWh, discharge 0.81 MW at 100:
  // profit 0.81·100 − 1·20 = 61.
  it('earns 61 on two price levels 20 and 100 with 0.9 efficiencies, free or cyclic', () => {
    expect(solveDispatchDp(problem([20, 100])).cost).toBeCloseTo(-61, 9);
    const cyclic = solveDispatchDp(problem([20, 100], { terminal: { kind: 'cyclic' } }));
    expect(cyclic.cost).toBeCloseTo(-61, 9);
    expect(cyclic.dischargeKw[1]).toBeCloseTo(810, 9);
  });

  // [D] fixture B: 55·0.85 < 50, so no trade pays.
  it('does not trade when the spread is below the round-trip loss', () => {
    const eta = Math.sqrt(0.85);
    const s = solveDispatchDp(problem([50, 55], {}, { efficiencyCharge: eta, efficiencyDischarge: eta }));
    expect(s.cost).toBe(0);
    expect(s.chargeKw).toEqual([0, 0]);
  });

  // [D] fixture C: two cycles of 50·1 − 10·1 = 40 each (80), or 50·0.81 − 10 = 30.5 each (61).
  it('runs two cycles on prices 10, 50, 10, 50', () => {
    expect(
      solveDispatchDp(
        problem([10, 50, 10, 50], { terminal: { kind: 'cyclic' } }, { efficiencyCharge: 1, efficiencyDischarge: 1 }),
      ).cost,
    ).toBeCloseTo(-80, 9);
    expect(solveDispatchDp(problem([10, 50, 10, 50], { terminal: { kind: 'cyclic' } })).cost).toBeCloseTo(-61, 9);
  });

  // [D] A negative price −50 with η = 0.9 and a full battery that must stay full: charging
  // is impossible, but charging 1000 kW while discharging d keeps the SoC when
  // 0.9·1000 = d/0.9, i.e. d = 810 kW, and imports 190 kW at −50: earns 9.5.
  it('charges and discharges at once at a negative price when that is the only way to consume', () => {
    const s = solveDispatchDp(problem([-50], { initialEnergyKwh: 1000, terminal: { kind: 'cyclic' } }));
    expect(s.cost).toBeCloseTo(-9.5, 9);
    expect(s.simultaneousSteps).toEqual([0]);
    const lp = solveWithGlpk(problem([-50], { initialEnergyKwh: 1000, terminal: { kind: 'cyclic' } }));
    expect(lp.objective).toBeCloseTo(-9.5, 9);
  });
});

describe('ties between optimal schedules', () => {
  // [D] at one flat price with η_ch·η_dis = 1 every cycle breaks even, so every schedule that
  // ends where it started costs 0; the documented rule (least energy moved per step, then
  // idling) must pick zero throughput.
  it('idles at flat prices with a lossless battery and a cyclic end', () => {
    const s = solveDispatchDp(
      problem(
        [40, 40, 40, 40, 40],
        { initialEnergyKwh: 500, terminal: { kind: 'cyclic' } },
        { efficiencyCharge: 1, efficiencyDischarge: 1 },
      ),
    );
    expect(s.cost).toBe(0);
    expect(s.chargeKw.every((c) => c === 0) && s.dischargeKw.every((d) => d === 0)).toBe(true);
  });
});

describe('infeasible models', () => {
  it('names the first step whose load exceeds the import limit plus the discharge power', () => {
    const p = problem([20, 30, 40, 50], {
      loadKw: [0, 500, 2500, 3000],
      site: { timezone: 'UTC', importLimitKw: 1000, exportLimitKw: null, demandChargePerKw: null },
      initialEnergyKwh: 1000,
    });
    const s = solveDispatchDp(p);
    expect(s.status).toBe('infeasible');
    expect(s.message).toMatch(
      /^step 2 \(2026-03-02T02:00:00.000Z\): net site load 2500 kW exceeds the import limit 1000 kW plus the discharge power 1000 kW/,
    );
    expect(solveWithGlpk(p).status).toBe('infeasible'); // [S] GLPK agrees
  });

  it('says when a target end SoC is out of reach', () => {
    const p = problem([20, 30], { terminal: { kind: 'target', socPct: 95 } }, { powerChargeKw: 400 });
    const s = solveDispatchDp(p);
    expect(s.status).toBe('infeasible');
    // [D] two hours at 400 kW and η 0.9 store at most 720 kWh = 72 %.
    expect(s.message).toMatch(/target:95 cannot be met: .* at most 72 %/);
    expect(solveWithGlpk(p).status).toBe('infeasible');
  });
});
