// The command line's operating-limit options (reserve prices, reserve duration,
// availability, initial power; battery keys rampKwPerMin and switchingCostPerMw):
// the output gains reserve series, reserve revenue, switching penalty, the method's
// reason and the binding limits, and stays exactly as before without them. Runs the
// real command on small files; the commands run in parallel in beforeAll.
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { repoRoot as root, runProcess as run, tempFiles, type Run } from '../support/cli-process';

const { file } = tempFiles('slackwater-limits-cli-');
const tsx = join(root, 'node_modules', '.bin', 'tsx');
const cli = (...args: string[]) => run(tsx, ['server/engine/cli/main.ts', ...args]);

const hours = Array.from({ length: 48 }, (_, t) => t);
const at = (t: number) => new Date(Date.UTC(2026, 4, 4, t)).toISOString();
const csv = (header: string, value: (t: number) => string, count = 48) =>
  [header, ...hours.slice(0, count).map((t) => `${at(t)},${value(t)}`)].join('\n');
const prices = file(
  'prices.csv',
  csv('time,price', (t) => (50 + 30 * Math.sin(((t % 24) - 10) / 3.8)).toFixed(2)),
);
const up = file(
  'up.csv',
  csv('timestamp,price', (t) => (6 + 4 * Math.cos(t / 5)).toFixed(2)),
);
const down = file(
  'down.csv',
  csv('timestamp,price', () => '3.5'),
);
const shortUp = file(
  'short-up.csv',
  csv('timestamp,price', () => '6', 20),
);
const availability = file(
  'availability.csv',
  csv('timestamp,availability', (t) => (t >= 14 && t < 18 ? '0.5' : '1')),
);
const badAvailability = file(
  'bad-availability.csv',
  csv('timestamp,availability', (t) => (t === 5 ? '1.5' : '1')),
);
const batteryKeys = {
  powerChargeKw: 1000,
  powerDischargeKw: 1000,
  energyKwh: 2000,
  socMinPct: 10,
  socMaxPct: 90,
  socInitialPct: 50,
  efficiencyCharge: 0.92,
  efficiencyDischarge: 0.92,
  selfDischargePctPerHour: 0,
  degradationCostPerMwh: 0,
  maxCyclesPerDay: null,
};
const battery = file('battery.json', JSON.stringify(batteryKeys));
const nullLimits = file(
  'battery-null-limits.json',
  JSON.stringify({ ...batteryKeys, rampKwPerMin: null, switchingCostPerMw: null }),
);
const limited = file('battery-limited.json', JSON.stringify({ ...batteryKeys, rampKwPerMin: 3, switchingCostPerMw: 4 }));
const site = file(
  'site.json',
  JSON.stringify({ timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null }),
);
const window = ['--start', '2026-05-04T06:00:00Z', '--end', '2026-05-05T06:00:00Z', '--horizon', '24', '--terminal', 'free'];
const plan = (b: string, ...extra: string[]) =>
  cli('plan', '--prices', prices, '--battery', b, '--site', site, ...window, ...extra);
const reserves = ['--reserve-up-prices', up, '--reserve-down-prices', down, '--reserve-hours', '1'];

const results: Record<string, Run> = {};
beforeAll(async () => {
  const jobs: Record<string, Promise<Run>> = {
    plain: plan(battery),
    nullLimits: plan(nullLimits),
    stacked: plan(limited, ...reserves, '--availability', availability, '--initial-power', '0'),
    reference: cli('reference', '--prices', prices, '--battery', limited, '--site', site, ...reserves),
    noHours: plan(battery, '--reserve-up-prices', up),
    short: plan(battery, '--reserve-up-prices', shortUp, '--reserve-hours', '1'),
    badAvailability: plan(battery, '--availability', badAvailability),
    steadyWithReserve: cli('steady', '--prices', prices, '--battery', battery, '--site', site, '--reserve-hours', '1'),
  };
  await Promise.all(Object.entries(jobs).map(async ([name, job]) => (results[name] = await job)));
}, 120_000);

const SERIES_KEYS = [
  'time',
  'priceImport',
  'chargeKw',
  'dischargeKw',
  'socKwh',
  'gridImportKw',
  'gridExportKw',
  'storedEnergyValue',
];

describe('command line with operating limits', () => {
  it('keeps a plan without limits exactly as before, whether the battery keys are absent or null', () => {
    const plain = results.plain!;
    expect(plain.code, plain.stderr).toBe(0);
    expect(results.nullLimits!.stdout).toBe(plain.stdout);
    const out = JSON.parse(plain.stdout);
    for (const key of ['reserveRevenue', 'switchingPenalty', 'methodReason', 'limits']) expect(out).not.toHaveProperty(key);
    expect(Object.keys(out.series[0])).toEqual(SERIES_KEYS);
    expect(out.method).toBe('dp');
  });

  it('reports reserve held and earned, the switching penalty, the method and its reason, and the binding limits', () => {
    const r = results.stacked!;
    expect(r.code, r.stderr).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.method).toBe('lp');
    expect(out.methodReason).toMatch(/reserves are held.*ramp rate \(3 kW\/min\).*switching cost \(4 per MW\)/);
    expect(Object.keys(out.series[0])).toEqual([...SERIES_KEYS, 'reserveUpKw', 'reserveDownKw']);
    // [D] DESIGN 3.3: reserve revenue Σ (ρ↑·r↑ + ρ↓·r↓)·Δt/1000 over the delivery window, recomputed from the output.
    const upPrice = (t: number) => 6 + 4 * Math.cos(t / 5);
    const revenue = out.series.reduce(
      (sum: number, p: { reserveUpKw: number; reserveDownKw: number }, k: number) =>
        sum + (Number(upPrice(6 + k).toFixed(2)) * p.reserveUpKw + 3.5 * p.reserveDownKw) / 1000,
      0,
    );
    expect(out.reserveRevenue).toBeGreaterThan(0);
    expect(out.reserveRevenue).toBeCloseTo(revenue, 6);
    // cost is cash: energy minus reserve revenue (pure arbitrage, no degradation).
    const energy = out.series.reduce(
      (sum: number, p: { priceImport: number; gridImportKw: number; gridExportKw: number }) =>
        sum + (p.priceImport * (p.gridImportKw - p.gridExportKw)) / 1000,
      0,
    );
    expect(out.cost).toBeCloseTo(energy - out.reserveRevenue, 6);
    expect(out.switchingPenalty).toBeGreaterThan(0);
    expect(out.limits).toEqual(
      expect.objectContaining({
        reserveHours: 1,
        rampKwPerMin: 3,
        switchingCostPerMw: 4,
        availability: true,
        initialNetPowerKw: 0,
      }),
    );
    expect(out.limits.binding.rampIntervals).toBeGreaterThan(0);
    expect(out.limits.notes).toContain(`ramp limit binding in ${out.limits.binding.rampIntervals} intervals`);
    expect(out.limits.notes.join(' ')).toMatch(/energy-neutral on average/);
    expect(out.limits.reserveHeadroom.headroomCost).toBeGreaterThanOrEqual(0);
    expect(out.limits.reserveHeadroom.stackedGain).toBeGreaterThanOrEqual(0);
    // [D] 3 kW/min × 60 min = 180 kW per hourly step; from 0 kW before the start.
    let before = 0;
    for (const p of out.series) {
      expect(Math.abs(p.dischargeKw - p.chargeKw - before)).toBeLessThanOrEqual(180 + 1e-6);
      before = p.dischargeKw - p.chargeKw;
    }
  });

  it('reference paths take the limits too', () => {
    const r = results.reference!;
    expect(r.code, r.stderr).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.reserveRevenue).toBeGreaterThan(0);
    expect(out.series).toHaveLength(48);
    expect(out.limits.binding).toEqual(expect.objectContaining({ rampIntervals: expect.any(Number) }));
  });

  it('exits 2 with what is missing or wrong', () => {
    expect(results.noHours!.code).toBe(2);
    expect(results.noHours!.stderr).toContain('need --reserve-hours D');
    expect(results.short!.code).toBe(2);
    expect(results.short!.stderr).toMatch(
      /upward reserve price profile does not cover the window: no price from step 14 \(2026-05-04 20:00/,
    );
    expect(results.badAvailability!.code).toBe(2);
    expect(results.badAvailability!.stderr).toContain(`${badAvailability}:7:`);
    expect(results.badAvailability!.stderr).toContain('the availability 1.5 is outside 0–1');
    expect(results.steadyWithReserve!.code).toBe(2);
    expect(results.steadyWithReserve!.stderr).toContain('the steady command has no option --reserve-hours');
  });
});
