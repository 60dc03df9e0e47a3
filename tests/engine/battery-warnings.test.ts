// One rule set for settings outside common practice: the command line, a plan the
// engine solves and the battery API (which calls batteryWarnings directly) list the
// same warnings for the same battery and site (docs/model.md, "Cautions").
import { describe, expect, it } from 'vitest';
import { batteryWarningMessages } from '@shared/schemas/battery-warnings';
import { parseArgs } from '../../server/engine/cli/cli-args';
import { referenceCommand, steadyCommand } from '../../server/engine/cli/run-commands';
import { solvePlan } from '../../server/engine/plan/solve-plan';
import { TURNPIKE_BATTERY, periodicInputs } from './support/periodic-inputs';

// The three settings the cautions name [docs/model.md]: a 0–100 % window, an efficiency
// above 0.98 and a C-rate above the rating (1.5 C here, above the 1 C threshold).
const risky = {
  ...TURNPIKE_BATTERY,
  socMinPct: 0,
  socMaxPct: 100,
  efficiencyCharge: 0.99,
  powerDischargeKw: 6000,
};
const inputs = periodicInputs(3, risky);
const args = (command: string) => parseArgs([command, '--prices', 'p.csv', '--battery', 'b.json']);

describe('warnings on battery settings', () => {
  const expected = batteryWarningMessages(risky, inputs.site);

  it('names the window, the efficiency and the C-rate the cautions list', () => {
    expect(expected.join(' ')).toMatch(/minimum state of charge of 0 %.*maximum state of charge of 100 %/);
    expect(expected.join(' ')).toContain('charging efficiency of 0.99 is above 0.98');
    expect(expected.join(' ')).toContain('discharge power is 1.5 C');
  });

  it('are the same on the command line and in a solved plan as in the shared rule set', () => {
    expect(steadyCommand(inputs, args('steady')).warnings).toEqual(expected);
    expect(referenceCommand(inputs, args('reference')).warnings).toEqual(expected);
    const t0 = inputs.timesMs[0]!;
    const plan = solvePlan(inputs, {
      startMs: t0,
      endMs: t0 + 24 * 3_600_000,
      horizonHours: 48,
      terminal: { kind: 'free' },
    });
    if (!plan.ok) throw new Error(plan.issue.message);
    expect(plan.plan.warnings).toEqual(expected);
  });
});
