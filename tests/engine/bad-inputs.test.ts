// Bad inputs get a status and a message naming the first offending parameter or
// interval, never an exception and never a silent answer. The conditions are
// [D] from the model of docs/model.md: a step whose net load exceeds the import
// limit plus the discharge power has no feasible site balance; an SoC window with
// min ≥ max holds no energy; efficiencies must lie in (0, 1].
import { describe, expect, it } from 'vitest';
import { solveDispatch } from '../../server/engine/dispatch/solve-dispatch';
import { alignInputs } from '../../server/engine/inputs/align-inputs';
import { solveSteadyCycle } from '../../server/engine/steady/solve-steady-cycle';
import { battery, problem } from './support/problem-builder';

const prices = [40, 60, 20, 80, 30, 70];
const site = { timezone: 'UTC', importLimitKw: 500, exportLimitKw: 500, demandChargePerKw: null };

describe('bad inputs', () => {
  it('names the first interval whose load exceeds the import limit plus the discharge power', () => {
    const loadKw = [100, 200, 300, 300, 1600, 1700];
    const s = solveDispatch(problem(prices, { site, loadKw }));
    expect(s.status).toBe('error');
    expect(s.message).toContain('step 4 (2026-01-01 04:00 +00:00)');
    expect(s.message).toContain('import limit (500 kW) plus the discharge power (1000 kW)');
  });

  it('reports an empty SoC window', () => {
    const s = solveDispatch(problem(prices, { battery: battery({ socMinPct: 60, socMaxPct: 40, socInitialPct: 50 }) }));
    expect(s.status).toBe('error');
    expect(s.message).toMatch(/SoC window is empty.*socMinPct 60 %.*socMaxPct 40 %/);
  });

  it('reports an initial SoC outside the window', () => {
    const s = solveDispatch(problem(prices, { battery: battery({ socMinPct: 10, socMaxPct: 90, socInitialPct: 5 }) }));
    expect(s.status).toBe('error');
    expect(s.message).toContain('initial SoC 5 % is outside the SoC window 10–90 %');
  });

  it.each([0, -0.5, 1.2, Number.NaN])('rejects a charging efficiency of %s, naming the parameter', (eta) => {
    const s = solveDispatch(problem(prices, { battery: battery({ efficiencyCharge: eta }) }));
    expect(s.status).toBe('error');
    expect(s.message).toContain('battery.efficiencyCharge');
  });

  it('names the first interval of a profile that holds no number', () => {
    const withGap = [40, 60, Number.NaN, 80, Number.NaN, 70];
    const s = solveDispatch(problem(withGap));
    expect(s.status).toBe('error');
    expect(s.message).toContain('import price profile has no valid number at step 2 (2026-01-01 02:00 +00:00)');
  });

  it('refuses an export price above the import price when the grid has no limits (unbounded earnings)', () => {
    const p = problem(prices);
    const s = solveDispatch({ ...p, priceExport: prices.map((v, t) => (t === 3 ? v + 5 : v)) });
    expect(s.status).toBe('error');
    expect(s.message).toContain('at step 3');
  });

  it('reports infeasible when the battery cannot hold out above the import limit, naming where it starts', () => {
    // 3 h at 300 kW above the limit need 900 kWh; only 500 kWh are stored (η = 1) and nothing can be charged.
    const limited = { ...site, importLimitKw: 1000 };
    const s = solveDispatch(
      problem([50, 50, 50], { site: limited, loadKw: [1300, 1300, 1300], battery: battery({ socInitialPct: 50 }) }),
      { method: 'lp' },
    );
    expect(s.status).toBe('infeasible');
    expect(s.message).toContain('step 0 (2026-01-01 00:00 +00:00)');
  });

  it("names the interval in the site's local time with its offset", () => {
    // [S] IANA tz database: Europe/Berlin keeps CET (UTC+01:00) in January, so 2026-01-01T04:00Z is 05:00 local.
    const berlin = { ...site, timezone: 'Europe/Berlin' };
    const s = solveDispatch(problem(prices, { site: berlin, loadKw: [100, 200, 300, 300, 1600, 1700] }));
    expect(s.message).toContain('step 4 (2026-01-01 05:00 +01:00)');
  });

  it('names a clock slot of the representative day, not a date, when the steady cycle cannot be served', () => {
    // [D] Two days of hourly load, 1600 kW from 17:00 local, against a 500 kW import limit and 1000 kW of discharge:
    // the 17:00 slot of the representative day averages 1600 kW, more than 1500 kW can serve.
    const start = Date.UTC(2026, 0, 1);
    const aligned = alignInputs({
      battery: battery(),
      site,
      prices: { startMs: start, stepMinutes: 60, values: Array.from({ length: 48 }, (_, t) => 40 + (t % 24)) },
      load: { startMs: start, stepMinutes: 60, values: Array.from({ length: 48 }, (_, t) => (t % 24 >= 17 ? 1600 : 100)) },
    });
    if (!aligned.ok) throw new Error(aligned.issue.message);
    const steady = solveSteadyCycle(aligned.inputs);
    if (!steady.ok) throw new Error(steady.issue.message);
    expect(steady.cycle.status).toBe('error');
    expect(steady.cycle.message).toContain('the 17:00 slot of the representative day');
    expect(steady.cycle.message).not.toContain('1970');
  });
});
