// The command line's contract: one JSON document on stdout, exit 0;
// bad input → exit 2 with the message on stderr. Runs the real command on small
// files written to a temporary folder; the commands run in parallel in beforeAll.
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { CliInputError, parseArgs, required } from '../../server/engine/cli/cli-args';
import { repoRoot as root, runProcess as run, tempFiles, type Run } from './support/cli-process';

const { file } = tempFiles('slackwater-cli-');

const tsx = join(root, 'node_modules', '.bin', 'tsx');
const cli = (...args: string[]) => run(tsx, ['server/engine/cli/main.ts', ...args]);

// Two UTC days of hourly prices: cheap nights, dear evenings.
const hours = Array.from({ length: 48 }, (_, t) => t);
const prices = file(
  'prices.csv',
  [
    'time,price',
    ...hours.map(
      (t) => `${new Date(Date.UTC(2026, 4, 4, t)).toISOString()},${(50 + 30 * Math.sin(((t % 24) - 10) / 3.8)).toFixed(2)}`,
    ),
  ].join('\n'),
);
const batteryKeys = {
  powerChargeKw: 1000,
  powerDischargeKw: 1000,
  energyKwh: 1000,
  socMinPct: 0,
  socMaxPct: 100,
  socInitialPct: 0,
  efficiencyCharge: 0.9,
  efficiencyDischarge: 0.9,
  selfDischargePctPerHour: 0,
  degradationCostPerMwh: 0,
  maxCyclesPerDay: null,
};
const battery = file('battery.json', JSON.stringify(batteryKeys));
const site = file(
  'site.json',
  JSON.stringify({ timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null }),
);
const fixtureA = file('fixture-a.csv', 'time,price\n2026-05-04T00:00:00Z,20\n2026-05-04T01:00:00Z,100\n');
const badBattery = file('bad-battery.json', JSON.stringify({ ...batteryKeys, efficiencyCharge: 1.5 }));
const badPrices = file('bad-prices.csv', 'time,price\n2026-05-04T00:00:00Z,20\n2026-05-04T01:00:00Z,1OO\n');
const common = ['--prices', prices, '--battery', battery, '--site', site];

const results: Record<string, Run> = {};

beforeAll(async () => {
  const jobs: Record<string, Promise<Run>> = {
    steady: run('npm', ['run', '--silent', 'cli', '--', 'steady', ...common]),
    reference: cli('reference', '--prices', fixtureA, '--battery', battery, '--site', site),
    plan: cli(
      'plan',
      ...common,
      '--start',
      '2026-05-04T12:00:00Z',
      '--end',
      '2026-05-05T00:00:00Z',
      '--horizon',
      '24',
      '--terminal',
      'steady-value',
    ),
    planWeekday: cli(
      'plan',
      ...common,
      '--start',
      '2026-05-04T12:00:00Z',
      '--end',
      '2026-05-05T00:00:00Z',
      '--horizon',
      '24',
      '--terminal',
      'free',
      '--days',
      'weekday',
    ),
    planWeekend: cli(
      'plan',
      ...common,
      '--start',
      '2026-05-04T12:00:00Z',
      '--end',
      '2026-05-05T00:00:00Z',
      '--horizon',
      '24',
      '--terminal',
      'free',
      '--days',
      'weekend',
    ),
    study: cli('study', ...common, '--horizons', '6,12', '--replan', '2', '--terminal', 'free,steady-value', '--workers', '1'),
    badBattery: cli('reference', '--prices', prices, '--battery', badBattery),
    badPrices: cli('reference', '--prices', badPrices, '--battery', battery),
  };
  await Promise.all(Object.entries(jobs).map(async ([name, job]) => (results[name] = await job)));
}, 120_000);

describe('command line', () => {
  it('steady (through npm run --silent cli): one JSON document with a slot per local hour', () => {
    const r = results.steady!;
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.slots).toHaveLength(24);
    expect(Object.keys(out.slots[0])).toEqual(
      expect.arrayContaining(['time', 'chargeKw', 'dischargeKw', 'socKwh', 'storedEnergyValue']),
    );
    expect(typeof out.cost).toBe('number');
    expect(typeof out.equivalentCycles).toBe('number');
  });

  it('reference on fixture A earns 61 (cost −61)', () => {
    // [D] worked fixture A: prices [20, 100], 1 MW / 1 MWh, η = 0.9 each, start empty → profit 61.
    const r = results.reference!;
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.cost).toBeCloseTo(-61, 6);
    expect(out.steps).toBe(2);
    expect(out.series[1].dischargeKw).toBeCloseTo(810, 4);
  });

  it('plan: the delivery window, its lookahead and turnpike figures', () => {
    const r = results.plan!;
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.steps).toBe(12);
    expect(out.lookahead.steps).toBe(12);
    expect(Object.keys(out.turnpike)).toEqual(
      expect.arrayContaining(['band', 'nearSteadyShare', 'entryArcSteps', 'leavingArcSteps', 'commitWindowSteps', 'flags']),
    );
  });

  it('plan --days: the steady cycle from weekdays only, and exit 2 when the data hold no weekend day', () => {
    // [D] 4 and 5 May 2026 are a Monday and a Tuesday (UTC site): two weekdays, no weekend day.
    const weekday = results.planWeekday!;
    expect(weekday.code, weekday.stderr).toBe(0);
    const out = JSON.parse(weekday.stdout);
    expect(out.steadyCycle).toEqual(expect.objectContaining({ days: 'weekday', daysAveraged: 2 }));
    expect(out.steadyCycle.notes).toContain('averaged over 2 weekday days by local clock slot');
    expect(JSON.parse(results.plan!.stdout).steadyCycle).toEqual(expect.objectContaining({ days: 'all', daysAveraged: 2 }));
    expect(results.planWeekend!.code).toBe(2);
    expect(results.planWeekend!.stderr).toContain('the profile must cover at least one whole weekend day');
  });

  it('study: a run per horizon and terminal rule, and a recommendation', () => {
    const r = results.study!;
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.runs).toHaveLength(4);
    expect(out.runs[0]).toEqual(expect.objectContaining({ horizonHours: 6, terminal: 'free', solves: 24 }));
    expect(out.recommendation).toEqual(expect.objectContaining({ horizonHours: expect.any(Number), reason: expect.any(String) }));
    expect(r.stderr).toContain('study: 4/4 runs done');
  });

  it('exits 2 naming the parameter for an efficiency outside (0, 1]', () => {
    expect(results.badBattery!.code).toBe(2);
    expect(results.badBattery!.stdout).toBe('');
    expect(results.badBattery!.stderr).toContain('battery.efficiencyCharge is 1.5');
  });

  it('exits 2 naming the file and line of a bad number in a profile', () => {
    expect(results.badPrices!.code).toBe(2);
    expect(results.badPrices!.stderr).toContain(`${badPrices}:3:`);
  });

  it('rejects a missing or unknown option with an input error (exit 2 in main.ts), checked in-process', () => {
    const plan = parseArgs([
      'plan',
      ...common,
      '--start',
      '2026-05-04T12:00:00Z',
      '--end',
      '2026-05-05T00:00:00Z',
      '--terminal',
      'free',
    ]);
    expect(() => required(plan, 'horizon')).toThrow(/needs --horizon/);
    expect(() => parseArgs(['steady', ...common, '--horizon', '5'])).toThrow(CliInputError);
    expect(() => parseArgs(['steady', ...common, '--horizon', '5'])).toThrow(/has no option --horizon/);
    expect(() => parseArgs(['forecast'])).toThrow(/unknown command "forecast"/);
  });
});
