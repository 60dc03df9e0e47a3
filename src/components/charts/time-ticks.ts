/**
 * Ticks of a time axis in the site's own clock: at round local times (every 15 minutes,
 * hour, 2, 3, 6 or 12 hours, day, week or month), as fine as fits in the width, so labels
 * never overlap; and their labels: the time of day, with the date under it where the day
 * changes (not the same date on every tick). Pure, so it is tested without a browser.
 */
import { createZoneClock, formatInstant, type ZoneClock } from '@shared/profile-csv';

const MINUTE_MS = 60_000;
const DAY_MS = 86_400_000;
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

interface LocalParts {
  ms: number;
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  /** Days since 1970-01-01 of the local date (for every-n-days steps). */
  dayNumber: number;
}

function partsOf(ms: number, clock: ZoneClock | null): LocalParts {
  const text = clock ? formatInstant(ms, clock) : new Date(ms).toISOString();
  const year = Number(text.slice(0, 4));
  const month = Number(text.slice(5, 7));
  const day = Number(text.slice(8, 10));
  return {
    ms,
    year,
    month,
    day,
    hour: Number(text.slice(11, 13)),
    minute: Number(text.slice(14, 16)),
    dayNumber: Date.UTC(year, month - 1, day) / DAY_MS,
  };
}

type Step = { unit: 'minute' | 'hour' | 'day' | 'month'; n: number };
const STEPS: Step[] = [
  { unit: 'minute', n: 15 },
  { unit: 'minute', n: 30 },
  ...[1, 2, 3, 6, 12].map((n) => ({ unit: 'hour' as const, n })),
  ...[1, 2, 7, 14].map((n) => ({ unit: 'day' as const, n })),
  ...[1, 2, 3, 6].map((n) => ({ unit: 'month' as const, n })),
];

function fits(p: LocalParts, step: Step): boolean {
  if (step.unit === 'minute') return p.minute % step.n === 0;
  if (p.minute !== 0) return false;
  if (step.unit === 'hour') return p.hour % step.n === 0;
  if (p.hour !== 0) return false;
  if (step.unit === 'day') return p.dayNumber % step.n === 0;
  return p.day === 1 && (p.month - 1) % step.n === 0;
}

/** The candidates: every quarter-hour of a short range, every local midnight of a long one. */
function candidates(startMs: number, endMs: number, clock: ZoneClock | null): LocalParts[] {
  const out: LocalParts[] = [];
  if (endMs - startMs <= 16 * DAY_MS) {
    const quarter = 15 * MINUTE_MS;
    for (let ms = Math.ceil(startMs / quarter) * quarter; ms <= endMs; ms += quarter) out.push(partsOf(ms, clock));
    return out;
  }
  // Local midnights: one candidate near each UTC day, moved to the day's local start.
  for (let ms = Math.floor(startMs / DAY_MS) * DAY_MS - DAY_MS; ms <= endMs + DAY_MS; ms += DAY_MS) {
    const p = partsOf(ms + 12 * 3_600_000, clock);
    const wall = Date.UTC(p.year, p.month - 1, p.day);
    const midnight = clock ? (clock.instantsOf(wall)[0] ?? clock.instantsOf(wall + 3_600_000)[0]) : wall;
    if (midnight !== undefined && midnight >= startMs && midnight <= endMs && out.at(-1)?.ms !== midnight)
      out.push(partsOf(midnight, clock));
  }
  return out;
}

export interface TimeTicks {
  /** Tick instants, epoch ms, ascending. */
  values: number[];
  /** True when the ticks are whole days or months: their labels carry no time of day. */
  daily: boolean;
}

/**
 * Round local times in [startMs, endMs] in `timeZone`, at most `maxTicks` of them. With `grid`
 * (the step starts of a bar chart, whose band scale knows only those), ticks are chosen among them.
 */
export function siteTimeTicks(
  startMs: number,
  endMs: number,
  timeZone: string,
  maxTicks: number,
  grid?: readonly number[],
): TimeTicks {
  const clock = createZoneClock(timeZone);
  const pool = grid
    ? grid.filter((ms) => ms >= startMs && ms <= endMs).map((ms) => partsOf(ms, clock))
    : candidates(startMs, endMs, clock);
  const most = Math.max(2, Math.floor(maxTicks));
  let chosen: { picked: LocalParts[]; step: Step } | null = null;
  for (const step of STEPS) {
    const picked = pool.filter((p) => fits(p, step));
    if (picked.length >= 2 && picked.length <= most) {
      chosen = { picked, step };
      break;
    }
    if (picked.length >= 2) chosen = { picked, step };
  }
  if (chosen === null) return { values: pool.slice(0, 1).map((p) => p.ms), daily: false };
  let { picked } = chosen;
  // Even the coarsest step is too fine (a very long range): keep every k-th.
  if (picked.length > most) {
    const every = Math.ceil(picked.length / most);
    picked = picked.filter((_, i) => i % every === 0);
  }
  return { values: picked.map((p) => p.ms), daily: chosen.step.unit === 'day' || chosen.step.unit === 'month' };
}

const pad = (n: number) => String(n).padStart(2, '0');

/**
 * One label per tick, lines separated by "\n": "18:00", with "5 Dec" under it at the first tick
 * and wherever the date changes; whole days as "5 Dec" (the year under it where it changes).
 */
export function timeTickLabels(ticks: TimeTicks, timeZone: string): string[] {
  const clock = createZoneClock(timeZone);
  let previous: LocalParts | null = null;
  return ticks.values.map((ms) => {
    const p = partsOf(ms, clock);
    const date = `${p.day} ${MONTHS[p.month - 1]}`;
    const newDay = previous === null || previous.dayNumber !== p.dayNumber;
    const newYear = previous === null || previous.year !== p.year;
    previous = p;
    if (ticks.daily) return newYear ? `${date}\n${p.year}` : date;
    const time = `${pad(p.hour)}:${pad(p.minute)}`;
    return newDay ? `${time}\n${date}` : time;
  });
}
