/**
 * The invented files in sample-data/ read as the README says: the demo
 * profiles are accepted with the stated shape, the format examples are
 * accepted with their options, and every file in sample-data/broken is
 * rejected with the lines listed in its hand-written expected-issues.json.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { decodeProfileBytes } from '../../shared/profile-csv/decode-profile-bytes';
import { parseProfileCsv, type ParseProfileOptions, type ParsedProfile } from '../../shared/profile-csv/parse-profile-csv';
import { BERLIN, HOUR_MS, at } from './support';

const DIR = path.resolve(import.meta.dirname, '../../sample-data');
const read = (file: string): string => decodeProfileBytes(readFileSync(path.join(DIR, file)));

function load(file: string, options: Omit<ParseProfileOptions, 'timezone'>): ParsedProfile {
  const result = parseProfileCsv(read(file), { timezone: BERLIN, ...options });
  if (!result.ok) throw new Error(`${file}: ${JSON.stringify(result.issues)}`);
  return result.profile;
}

const hourFormat = new Intl.DateTimeFormat('en-GB', { timeZone: BERLIN, hour: '2-digit', hourCycle: 'h23' });
const localHour = (ms: number): number => Number(hourFormat.format(ms));

describe('demo profiles', () => {
  // 2026 has 365 days; its 23- and 25-hour DST days cancel, so 8760 hours [D].
  it.each([
    ['prices-2026-hourly.csv', 'price', 'currency/MWh'],
    ['site-load-2026-hourly.csv', 'load', 'kW'],
    ['pv-generation-2026-hourly.csv', 'generation', 'kW'],
  ] as const)('%s is a year of hourly values from local midnight 2026-01-01', (file, kind, unit) => {
    const profile = load(file, { kind, unit });
    expect(profile.startMs).toBe(at('2026-01-01T00:00:00+01:00'));
    expect(profile.stepMinutes).toBe(60);
    expect(profile.values).toHaveLength(8760);
    expect(profile.startMs + 8760 * HOUR_MS).toBe(at('2027-01-01T00:00:00+01:00'));
  });

  // 7 days × 96 quarter-hours, no DST change between 4 and 11 May [D].
  it.each([
    ['prices-week-2026-05-04-15min.csv', 'price', 'currency/MWh'],
    ['site-load-week-2026-05-04-15min.csv', 'load', 'kW'],
    ['pv-generation-week-2026-05-04-15min.csv', 'generation', 'kW'],
  ] as const)('%s is a week of 15-minute values from Monday 2026-05-04', (file, kind, unit) => {
    const profile = load(file, { kind, unit });
    expect(profile.startMs).toBe(at('2026-05-04T00:00:00+02:00'));
    expect(profile.stepMinutes).toBe(15);
    expect(profile.values).toHaveLength(672);
  });

  it('prices include negative hours, at midday from spring to autumn only', () => {
    const { values, startMs } = load('prices-2026-hourly.csv', { kind: 'price', unit: 'currency/MWh' });
    const negative = values.flatMap((v, i) => (v < 0 ? [startMs + i * HOUR_MS] : []));
    expect(negative.length).toBeGreaterThan(20);
    for (const ms of negative) {
      expect(localHour(ms)).toBeGreaterThanOrEqual(9);
      expect(localHour(ms)).toBeLessThanOrEqual(17);
      const month = new Date(ms).getUTCMonth() + 1;
      expect(month).toBeGreaterThanOrEqual(3);
      expect(month).toBeLessThanOrEqual(10);
    }
  });

  it('site load stays within a commercial site of 1-3 MW and PV within its 1.5 MWp, dark at midnight', () => {
    const siteLoad = load('site-load-2026-hourly.csv', { kind: 'load', unit: 'kW' }).values;
    expect(Math.min(...siteLoad)).toBeGreaterThanOrEqual(900);
    expect(Math.max(...siteLoad)).toBeLessThanOrEqual(3000);
    const pv = load('pv-generation-2026-hourly.csv', { kind: 'generation', unit: 'kW' });
    expect(Math.min(...pv.values)).toBe(0);
    expect(Math.max(...pv.values)).toBeLessThanOrEqual(1500);
    pv.values.forEach((v, i) => {
      if (localHour(pv.startMs + i * HOUR_MS) === 0) expect(v).toBe(0);
    });
  });
});

describe('format examples', () => {
  it('reads local times with semicolons and decimal commas', () => {
    const profile = load('formats/prices-day-local-semicolon-decimal-comma.csv', { kind: 'price', unit: 'currency/MWh' });
    expect(profile.startMs).toBe(at('2026-05-05T00:00:00+02:00'));
    expect(profile.values).toHaveLength(96);
  });

  it('reads interval-ending MWh per hour as kW from the interval start', () => {
    const profile = load('formats/site-load-day-interval-ending-mwh.csv', { kind: 'load', unit: 'MWh', intervalEnding: true });
    expect(profile.startMs).toBe(at('2026-05-05T00:00:00+02:00'));
    expect(profile.values).toHaveLength(24);
    // The first row is 1.0386 MWh in one hour = 1038.6 kW [D].
    expect(profile.values[0]).toBeCloseTo(1038.6, 6);
  });

  it('reads a file with a BOM, CRLF line ends and quoted newlines', () => {
    const profile = load('formats/bom-crlf-quoted-newlines.csv', { kind: 'price', unit: 'currency/MWh' });
    expect(profile.values).toEqual([48.51, 41.46, -3.2, 58.25]);
  });
});

interface Expected {
  file: string;
  options: ParseProfileOptions;
  issues: { line: number; messageIncludes: string }[];
  acceptedWithFillGaps?: { filledIndexes: number[]; values: number[] };
}
const expected = JSON.parse(read('broken/expected-issues.json')) as Expected[];

describe('broken examples', () => {
  it.each(expected.map((e) => [e.file, e] as const))('rejects %s with the listed lines', (file, e) => {
    const result = parseProfileCsv(read(`broken/${file}`), e.options);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues.map((i) => i.line)).toEqual(e.issues.map((i) => i.line));
    e.issues.forEach((want, k) => expect(result.issues[k]?.message).toContain(want.messageIncludes));
  });

  it('accepts gap.csv with gap filling, interpolating the two missing quarter-hours', () => {
    // 46 at 00:30 and 40 at 01:15: the straight line gives 44 and 42 [D].
    const gap = expected.find((e) => e.file === 'gap.csv');
    const profile = load('broken/gap.csv', { kind: 'price', unit: 'currency/MWh', fillGaps: true });
    expect(profile.values).toEqual(gap?.acceptedWithFillGaps?.values);
    expect(profile.filledIndexes).toEqual(gap?.acceptedWithFillGaps?.filledIndexes);
  });
});
