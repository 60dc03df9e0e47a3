// Worked fixtures of docs/sources.md ("Worked fixtures [D]", checked there with an
// independent LP solver) and a closed-form case derived below, on both backends.
import { describe, expect, it } from 'vitest';
import { solveDispatch } from '../../server/engine/dispatch/solve-dispatch';
import { battery, problem } from './support/problem-builder';

const backends = ['highs', 'glpk'] as const;

describe.each(backends)('worked fixtures on %s', (backend) => {
  const solve = (p: Parameters<typeof solveDispatch>[0]) => solveDispatch(p, { method: 'lp', backend });
  const eta09 = battery({ efficiencyCharge: 0.9, efficiencyDischarge: 0.9 });

  it('fixture A: charges 1 MW at 20 and discharges 0.81 MW at 100 for a profit of 61, free or cyclic', () => {
    // [D] worked fixture A: 1 MWh bought at 20 stores 0.9 MWh, which delivers 0.81 MWh at 100: 81 − 20 = 61.
    const free = solve(problem([20, 100], { battery: eta09 }));
    expect(free.cost).toBeCloseTo(-61, 9);
    expect(free.chargeKw[0]).toBeCloseTo(1000, 6);
    expect(free.dischargeKw[1]).toBeCloseTo(810, 6);
    expect(solve(problem([20, 100], { battery: eta09, terminal: { kind: 'cyclic' } })).cost).toBeCloseTo(-61, 9);
  });

  it('fixture B: does not trade when the spread does not cover the round-trip loss', () => {
    // [D] worked fixture B: 55 · 0.85 < 50, so every trade loses money.
    const b = battery({ efficiencyCharge: Math.sqrt(0.85), efficiencyDischarge: Math.sqrt(0.85) });
    const s = solve(problem([50, 55], { battery: b }));
    expect(s.cost).toBeCloseTo(0, 9);
    expect(Math.max(...s.chargeKw, ...s.dischargeKw)).toBeLessThan(1e-6);
  });

  it('fixture C: two cycles earn 80 without losses and 61 with 0.9 efficiencies (cyclic)', () => {
    // [D] worked fixture C: 2 · (50 − 10) = 80; 2 · (50 · 0.81 − 10) = 61.
    expect(solve(problem([10, 50, 10, 50], { terminal: { kind: 'cyclic' } })).cost).toBeCloseTo(-80, 9);
    expect(solve(problem([10, 50, 10, 50], { battery: eta09, terminal: { kind: 'cyclic' } })).cost).toBeCloseTo(-61, 9);
  });

  it('demand charge fixture: shaves the 10 MW peak to 8 MW at 100 per MW and does not shave at 10 per MW', () => {
    // [D] worked demand-charge fixture: load [5, 5, 10, 5] MW, flat 50 /MWh, 2 MW / 4 MWh, η = 0.9 each,
    // cyclic. D is per kW in the engine: 100 /MW = 0.1 /kW.
    const b = battery({
      powerChargeKw: 2000,
      powerDischargeKw: 2000,
      energyKwh: 4000,
      efficiencyCharge: 0.9,
      efficiencyDischarge: 0.9,
      socInitialPct: 50,
    });
    const withCharge = (perKw: number) =>
      solve(
        problem([50, 50, 50, 50], {
          battery: b,
          loadKw: [5000, 5000, 10000, 5000],
          terminal: { kind: 'cyclic' },
          site: { timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: perKw },
        }),
      );
    const high = withCharge(0.1);
    expect(high.cost).toBeCloseTo(2073.4568, 3);
    expect(high.peakImportKw).toBeCloseTo(8000, 4);
    const low = withCharge(0.01);
    expect(low.cost).toBeCloseTo(1350, 6);
    expect(low.peakImportKw).toBeCloseTo(10000, 4);
  });

  it('matches the closed-form profit of two price levels when the battery shifts exactly its usable energy', () => {
    // [D] Closed form. Prices: p_lo for k steps, then p_hi for k steps (Δt = 1 h); start at the SoC minimum,
    // usable energy U = E·(max − min). Charging power P_ch = U / (η_ch · k) fills the window in exactly k low
    // steps; discharging power P_dis = U · η_dis / k empties it in exactly k high steps. With
    // p_hi · η_ch · η_dis > p_lo every stored MWh pays, so the optimum buys U/η_ch at p_lo and sells U·η_dis at
    // p_hi: profit = (p_hi · U · η_dis − p_lo · U / η_ch) / 1000 with U in kWh, and no schedule can do more
    // because the window holds at most U and each price level lasts k steps.
    const k = 3;
    const [pLo, pHi, etaC, etaD] = [30, 90, 0.95, 0.9];
    const b = battery({
      energyKwh: 2000,
      socMinPct: 10,
      socMaxPct: 90,
      socInitialPct: 10,
      efficiencyCharge: etaC,
      efficiencyDischarge: etaD,
    });
    const usable = 1600;
    const sized = { ...b, powerChargeKw: usable / (etaC * k), powerDischargeKw: (usable * etaD) / k };
    const s = solve(problem([...Array(k).fill(pLo), ...Array(k).fill(pHi)], { battery: sized }));
    expect(s.cost).toBeCloseTo(-(pHi * usable * etaD - (pLo * usable) / etaC) / 1000, 9);
  });
});
