/**
 * Writes the invented demo profiles under sample-data/ (seeded, so every run
 * writes the same bytes on the same Node version). Nothing here is market or
 * metered data: prices, load and PV come from simple made-up shapes plus noise.
 * Run: npx tsx scripts/generate-sample-data.ts
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { createZoneClock, formatInstant, type ZoneClock } from '../shared/profile-csv/zone-clock';

const SEED = 20260101;
const TIME_ZONE = 'Europe/Berlin';
const OUT = path.resolve(import.meta.dirname, '../sample-data');
const HOUR_MS = 3_600_000;
const DAY_MS = 24 * HOUR_MS;
const YEAR_START = Date.parse('2026-01-01T00:00:00+01:00');
const YEAR_END = Date.parse('2027-01-01T00:00:00+01:00');
const WEEK_START = Date.parse('2026-05-04T00:00:00+02:00'); // a Monday in May: long days, midday surplus
const WEEK_END = WEEK_START + 7 * DAY_MS;
const PV_PEAK_KW = 1500; // rooftop array of about 1.5 MWp
const LATITUDE_DEG = 51; // an invented site in central Europe
const LONGITUDE_DEG = 10;

/** Mulberry32: a small seeded PRNG, good enough for demo noise. */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function normal(random: () => number): number {
  const u = Math.max(random(), 1e-12);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random());
}

interface LocalTime {
  readonly hour: number; // local clock hour with fraction
  readonly weekday: number; // 0 = Sunday
  readonly dayOfYear: number; // 0-based
  readonly dayIndex: number; // days since 2026-01-01 local
}

function localTime(ms: number, clock: ZoneClock): LocalTime {
  const local = new Date(ms + clock.offsetAt(ms) * 60_000);
  const midnight = Date.UTC(local.getUTCFullYear(), local.getUTCMonth(), local.getUTCDate());
  const dayIndex = Math.round((midnight - Date.UTC(2026, 0, 1)) / DAY_MS);
  return {
    hour: (local.getTime() - midnight) / HOUR_MS,
    weekday: local.getUTCDay(),
    dayOfYear: Math.round((midnight - Date.UTC(local.getUTCFullYear(), 0, 1)) / DAY_MS),
    dayIndex,
  };
}

/** Per-day weather and market level shared by all files, so prices, PV and load agree. */
interface Day {
  readonly clearness: number; // 0.15 (overcast) .. 1 (clear)
  readonly priceLevel: number; // day-to-day price drift, currency/MWh
  readonly warmth: number; // temperature anomaly, roughly °C
}

function makeDays(random: () => number, count: number): Day[] {
  const days: Day[] = [];
  let clear = 0.6;
  let level = 0;
  let warmth = 0;
  for (let d = 0; d < count; d += 1) {
    clear = Math.min(1, Math.max(0.15, 0.55 * clear + 0.45 * random() * 1.15 + 0.05 * normal(random)));
    level = 0.7 * level + 9 * normal(random);
    warmth = 0.8 * warmth + 1.5 * normal(random);
    days.push({ clearness: clear, priceLevel: level, warmth });
  }
  return days;
}

const bump = (x: number, centre: number, width: number): number => Math.exp(-((x - centre) ** 2) / (2 * width * width));

/** Sun height for the invented site (Cooper's declination, no equation of time): sin of the elevation. */
function sunHeight(ms: number, dayOfYear: number): number {
  const rad = Math.PI / 180;
  const declination = 23.44 * rad * Math.sin((2 * Math.PI * (284 + dayOfYear + 1)) / 365);
  const solarHours = ((ms / HOUR_MS) % 24) + LONGITUDE_DEG / 15;
  const hourAngle = 15 * rad * (solarHours - 12);
  const lat = LATITUDE_DEG * rad;
  return Math.sin(lat) * Math.sin(declination) + Math.cos(lat) * Math.cos(declination) * Math.cos(hourAngle);
}

/** Mean PV output over the interval starting at ms (evaluated at its midpoint), kW. */
function pvKw(ms: number, stepMs: number, day: Day, clock: ZoneClock, random: () => number): number {
  const mid = ms + stepMs / 2;
  const height = sunHeight(mid, localTime(mid, clock).dayOfYear);
  if (height <= 0) return 0;
  const clearSky = 0.82 * PV_PEAK_KW * height ** 1.15;
  const cloud = day.clearness * (1 + 0.12 * normal(random) * (1 - day.clearness));
  return Math.min(0.9 * PV_PEAK_KW, Math.max(0, clearSky * cloud));
}

/** Day-ahead style price, currency/MWh: double peak, weekend dip, winter premium, midday solar dip. */
function priceAt(ms: number, day: Day, clock: ZoneClock, random: () => number): number {
  const t = localTime(ms, clock);
  const winter = Math.cos((2 * Math.PI * (t.dayOfYear - 15)) / 365); // +1 mid-January, -1 mid-July
  const summer = 0.5 - 0.5 * winter;
  const weekend = t.weekday === 0 ? 1 : t.weekday === 6 ? 0.6 : 0;
  const peaks = (1 - 0.45 * weekend) * (28 * bump(t.hour, 8, 1.6) + 38 * bump(t.hour, 19, 2));
  const night = -14 * bump(t.hour, 3.5, 2);
  const solarDip = -(15 + 115 * summer) * day.clearness ** 1.5 * bump(t.hour, 13, 2.3) * (1 + 0.5 * weekend);
  const level = 82 + 22 * winter - 14 * weekend + day.priceLevel;
  return level + peaks + night + solarDip + 4 * normal(random);
}

/** Commercial site load, kW: offices and cooling on working days, a base load always. */
function loadKw(ms: number, day: Day, clock: ZoneClock, random: () => number): number {
  const t = localTime(ms, clock);
  const working = t.weekday >= 1 && t.weekday <= 5;
  const summer = 0.5 - 0.5 * Math.cos((2 * Math.PI * (t.dayOfYear - 15)) / 365);
  const open = working
    ? 1 / (1 + Math.exp(-(t.hour - 7) * 2.5)) - 1 / (1 + Math.exp(-(t.hour - 19) * 2.5))
    : 0.15 * bump(t.hour, 12, 3);
  const cooling = Math.max(0, summer * 9 + day.warmth) * 55 * bump(t.hour, 15, 3.5);
  const heating = Math.max(0, (1 - summer) * 6 - day.warmth) * 25 * bump(t.hour, 8, 2.5);
  const base = 1050 + 1150 * open + cooling + heating;
  return Math.min(3000, Math.max(900, base * (1 + 0.025 * normal(random))));
}

type Series = { header: string; decimals: number; at: (ms: number, stepMs: number, day: Day) => number };

/** How a file is written: the main files use RFC 3339 offsets, commas and interval-beginning labels. */
interface Style {
  readonly delimiter: ',' | ';';
  /** Local wall-clock times without offsets (only for days without a DST change). */
  readonly localTimes: boolean;
  readonly intervalEnding: boolean;
  /** Multiplies each value, e.g. kW to MWh per interval. */
  readonly scale: number;
}

const MAIN_STYLE: Style = { delimiter: ',', localTimes: false, intervalEnding: false, scale: 1 };

function writeSeries(
  file: string,
  series: Series,
  from: number,
  to: number,
  stepMs: number,
  days: Day[],
  clock: ZoneClock,
  style = MAIN_STYLE,
) {
  const lines = [`${style.intervalEnding ? 'interval_end' : 'time'}${style.delimiter}${series.header}`];
  const values: number[] = [];
  for (let ms = from; ms < to; ms += stepMs) {
    const day = days[localTime(ms, clock).dayIndex] ?? days[days.length - 1];
    if (!day) throw new Error('no day parameters');
    const value = Number((series.at(ms, stepMs, day) * style.scale).toFixed(series.decimals));
    values.push(value === 0 ? 0 : value);
    const label = formatInstant(ms + (style.intervalEnding ? stepMs : 0), clock);
    const text = value.toFixed(series.decimals);
    lines.push(
      `${style.localTimes ? label.slice(0, 16) : label}${style.delimiter}${style.delimiter === ';' ? text.replace('.', ',') : text}`,
    );
  }
  writeFileSync(path.join(OUT, file), `${lines.join('\n')}\n`);
  return {
    file,
    rows: values.length,
    min: Math.min(...values),
    max: Math.max(...values),
    negative: values.filter((v) => v < 0).length,
  };
}

function main(): void {
  const clock = createZoneClock(TIME_ZONE);
  if (clock === null) throw new Error(`${TIME_ZONE} unknown to this runtime`);
  mkdirSync(path.join(OUT, 'broken'), { recursive: true });
  mkdirSync(path.join(OUT, 'formats'), { recursive: true });
  const days = makeDays(mulberry32(SEED), 366);
  // One noise stream per file, so regenerating one file never shifts another.
  const series = (
    header: string,
    decimals: number,
    model: (ms: number, stepMs: number, day: Day, r: () => number) => number,
    seed: number,
  ): Series => {
    const random = mulberry32(SEED + seed);
    return { header, decimals, at: (ms, stepMs, day) => model(ms, stepMs, day, random) };
  };
  const price = (ms: number, _s: number, day: Day, r: () => number) => priceAt(ms, day, clock, r);
  const load = (ms: number, _s: number, day: Day, r: () => number) => loadKw(ms, day, clock, r);
  const pv = (ms: number, stepMs: number, day: Day, r: () => number) => pvKw(ms, stepMs, day, clock, r);

  const year = [YEAR_START, YEAR_END, HOUR_MS] as const;
  const week = [WEEK_START, WEEK_END, HOUR_MS / 4] as const;
  const demo = [
    ['prices-2026-hourly.csv', series('price', 2, price, 1), year],
    ['prices-week-2026-05-04-15min.csv', series('price', 2, price, 2), week],
    ['site-load-2026-hourly.csv', series('load', 1, load, 3), year],
    ['site-load-week-2026-05-04-15min.csv', series('load', 1, load, 4), week],
    ['pv-generation-2026-hourly.csv', series('generation', 1, pv, 5), year],
    ['pv-generation-week-2026-05-04-15min.csv', series('generation', 1, pv, 6), week],
  ] as const;
  const summary = demo.map(([file, s, [from, to, stepMs]]) => writeSeries(file, s, from, to, stepMs, days, clock));

  // Other accepted layouts of one day (2026-05-05, no DST change), for the upload journeys.
  const dayStart = WEEK_START + DAY_MS;
  const dayEnd = dayStart + DAY_MS;
  summary.push(
    writeSeries(
      'formats/prices-day-local-semicolon-decimal-comma.csv',
      series('price', 2, price, 7),
      dayStart,
      dayEnd,
      HOUR_MS / 4,
      days,
      clock,
      {
        ...MAIN_STYLE,
        delimiter: ';',
        localTimes: true,
      },
    ),
    // kW averaged over an hour is kWh in that hour; /1000 gives MWh per interval.
    writeSeries(
      'formats/site-load-day-interval-ending-mwh.csv',
      series('load', 4, load, 8),
      dayStart,
      dayEnd,
      HOUR_MS,
      days,
      clock,
      {
        ...MAIN_STYLE,
        intervalEnding: true,
        scale: 1 / 1000,
      },
    ),
  );
  console.log(JSON.stringify({ seed: SEED, timeZone: TIME_ZONE, files: summary }, null, 2));
}

main();
