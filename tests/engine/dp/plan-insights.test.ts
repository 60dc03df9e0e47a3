import { describe, expect, it } from 'vitest';
import { parseArgs } from '../../../server/engine/cli/cli-args';
import { readInputs } from '../../../server/engine/cli/read-inputs';
import { planCommand } from '../../../server/engine/cli/run-commands';

const common = [
  '--prices',
  'sample-data/prices-2026-hourly.csv',
  '--battery',
  'sample-data/demo-battery.json',
  '--site',
  'sample-data/demo-site.json',
];
const window = ['--start', '2026-05-04T00:00:00Z', '--end', '2026-05-05T00:00:00Z', '--terminal', 'free'];

function plan(extra: string[]): ReturnType<typeof planCommand> {
  const args = parseArgs(['plan', ...common, ...window, ...extra]);
  return planCommand(
    readInputs(args, () => undefined),
    args,
  );
}

describe('plan output of the command line with the exact DP', () => {
  const dp = plan(['--horizon', '72']);
  const delivery = dp.steps;

  it('reports the method, the decision horizon and value curves for the first step and each whole hour', () => {
    expect(dp.method).toBe('dp');
    expect(dp.decisionHorizonHours).toBeGreaterThanOrEqual(delivery);
    expect(dp.decisionHorizonHours).toBeLessThanOrEqual(72);
    expect(dp.valueCurves.map((c) => c.time)).toEqual(dp.series.map((s) => s.time));
    for (const curve of dp.valueCurves) {
      expect(curve.points[0]!.socPct).toBeCloseTo(10, 9);
      expect(curve.points[curve.points.length - 1]!.socPct).toBeCloseTo(90, 9);
    }
  });

  it('costs the same as the LP path (HiGHS/GLPK) on the same plan', () => {
    // [S] the LP path solves the same model with general LP solvers.
    const lp = plan(['--horizon', '72', '--method', 'lp']);
    expect(lp.method).toBe('lp');
    expect(lp.decisionHorizonHours).toBeNull();
    expect(Math.abs(dp.cost - lp.cost)).toBeLessThanOrEqual(1e-6 * Math.max(1, Math.abs(lp.cost)));
  });

  it('keeps every delivery decision when the horizon is cut to the decision horizon', () => {
    const cut = plan(['--horizon', String(Math.ceil(dp.decisionHorizonHours!))]);
    expect(cut.series.map((s) => s.socKwh)).toEqual(dp.series.map((s) => s.socKwh));
  });
});
