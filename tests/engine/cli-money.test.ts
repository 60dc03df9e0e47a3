// The command line's money figures (DESIGN section 3.1), the battery's rated
// cycles and the site's currency: new keys beside the existing ones, and exit 2
// with a message for bad values. Runs the real command on small temporary files.
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { repoRoot as root, runProcess as run, tempFiles, type Run } from './support/cli-process';

const { file } = tempFiles('slackwater-cli-money-');
const tsx = join(root, 'node_modules', '.bin', 'tsx');
const cli = (...args: string[]) => run(tsx, ['server/engine/cli/main.ts', ...args]);

// Two UTC days of hourly prices alternating 10 and 100: a battery that follows them cycles twelve times a day.
const prices = file(
  'prices.csv',
  [
    'time,price',
    ...Array.from({ length: 48 }, (_, t) => `${new Date(Date.UTC(2026, 4, 4, t)).toISOString()},${t % 2 ? 100 : 10}`),
  ].join('\n'),
);
const batteryKeys = {
  powerChargeKw: 1000,
  powerDischargeKw: 1000,
  energyKwh: 1000,
  socMinPct: 0,
  socMaxPct: 100,
  socInitialPct: 0,
  efficiencyCharge: 0.95,
  efficiencyDischarge: 0.95,
  selfDischargePctPerHour: 0,
  degradationCostPerMwh: 0,
  maxCyclesPerDay: null,
};
const unrated = file('battery.json', JSON.stringify(batteryKeys));
const rated = file('rated.json', JSON.stringify({ ...batteryKeys, maxRatedCyclesPerDay: 15 }));
const badRating = file('bad-rating.json', JSON.stringify({ ...batteryKeys, maxRatedCyclesPerDay: -1 }));
const siteKeys = { timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null };
const euroSite = file('site.json', JSON.stringify({ ...siteKeys, currency: 'EUR' }));
const badCurrency = file('bad-site.json', JSON.stringify({ ...siteKeys, currency: 'euro' }));
const window = ['--start', '2026-05-04T00:00:00Z', '--end', '2026-05-05T00:00:00Z'];
const NET_KEYS = ['storedEnergyChange', 'netCost', 'noBatteryCost', 'batteryValue', 'storedEnergyValuation'];

const results: Record<string, Run> = {};

beforeAll(async () => {
  const common = ['--prices', prices, '--site', euroSite];
  const jobs: Record<string, Promise<Run>> = {
    plan: cli('plan', ...common, '--battery', unrated, ...window, '--horizon', '24', '--terminal', 'free'),
    planRated: cli('plan', ...common, '--battery', rated, ...window, '--horizon', '24', '--terminal', 'free'),
    reference: cli('reference', ...common, '--battery', unrated, '--days', 'weekday'),
    study: cli('study', ...common, '--battery', unrated, '--horizons', '2,6', '--replan', '1', '--terminal', 'free,steady-value'),
    badRating: cli('reference', ...common, '--battery', badRating),
    badCurrency: cli('reference', '--prices', prices, '--site', badCurrency, '--battery', unrated),
    euroUnit: cli('reference', ...common, '--battery', unrated, '--price-unit', 'EUR/MWh'),
    poundUnit: cli('reference', ...common, '--battery', unrated, '--price-unit', 'GBP/MWh'),
  };
  await Promise.all(Object.entries(jobs).map(async ([name, job]) => (results[name] = await job)));
}, 120_000);

const output = (name: string) => {
  const r = results[name]!;
  expect(r.code, r.stderr).toBe(0);
  return JSON.parse(r.stdout);
};

describe('command line money figures', () => {
  it('plan: net figures beside the cash cost, valued in the site currency, and the heavy-cycling check', () => {
    const out = output('plan');
    expect(Object.keys(out)).toEqual(expect.arrayContaining(['cost', ...NET_KEYS, 'cycling']));
    expect(out.netCost).toBeCloseTo(out.cost - out.storedEnergyChange, 9);
    expect(out.noBatteryCost).toBe(0);
    expect(out.batteryValue).toBeCloseTo(-out.netCost, 9);
    expect(out.storedEnergyValuation.description).toMatch(/EUR\/MWh for 00:00/);
    expect(out.cycling).toMatchObject({ limitSource: 'common practice', heavy: true });
    expect(out.warnings.join(' ')).toContain('Heavy cycling');
    expect(Object.keys(out.turnpike)).toEqual(expect.arrayContaining(['excursions', 'summary', 'longerLookaheadHours']));
    expect(out.turnpike.excursions).toEqual(expect.objectContaining({ count: expect.any(Number), steps: expect.any(Number) }));
    const rated = output('planRated');
    expect(rated.cycling).toMatchObject({ limitPerDay: 15, limitSource: 'battery rating', heavy: false });
  });

  it('reference and study: the same keys, the gap in currency and in % of the battery value', () => {
    const reference = output('reference');
    expect(Object.keys(reference)).toEqual(expect.arrayContaining(['cost', ...NET_KEYS]));
    const study = output('study');
    expect(Object.keys(study)).toEqual(
      expect.arrayContaining([
        'referenceCost',
        'referenceNetCost',
        'referenceBatteryValue',
        'noBatteryCost',
        'storedEnergyValuation',
      ]),
    );
    for (const run of study.runs) {
      expect(Object.keys(run)).toEqual(
        expect.arrayContaining(['cost', 'gapPct', 'netCost', 'gapValue', 'valueGapPct', 'batteryValue', 'endSocKwh', 'cycling']),
      );
      expect(run.gapValue).toBeCloseTo(run.netCost - study.referenceNetCost, 9);
      expect(run.valueGapPct).toBeCloseTo((100 * run.gapValue) / Math.abs(study.referenceBatteryValue), 9);
    }
    expect(study.recommendation).toEqual(expect.objectContaining({ metTarget: expect.any(Boolean) }));
    expect(study.recommendation.reason).toMatch(/EUR/);
  });

  it("takes prices in the site's currency and refuses another one", () => {
    expect(output('euroUnit').cost).toBeCloseTo(output('reference').cost, 9);
    expect(results.poundUnit!.code).toBe(2);
    expect(results.poundUnit!.stderr).toContain("The prices are in GBP/MWh, but this site's money is in EUR");
  });

  it('exits 2 for a rating that is not positive and for a currency that is not an ISO 4217 code', () => {
    expect(results.badRating!.code).toBe(2);
    expect(results.badRating!.stderr).toContain('battery.maxRatedCyclesPerDay is -1');
    expect(results.badCurrency!.code).toBe(2);
    expect(results.badCurrency!.stderr).toContain('"currency" in');
    expect(results.badCurrency!.stderr).toContain('three-letter ISO 4217 code');
  });
});
