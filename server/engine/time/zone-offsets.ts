/**
 * Local clock facts (UTC offset, local day, minute of day, weekday) for every step
 * of a regular time grid. Offsets come from @date-fns/tz (the runtime's Intl zone
 * data). Asking Intl once per step costs ~10 µs each (90 ms for a year of hours,
 * measured), so we sample once per day and bisect only the days whose offset
 * changes: a few hundred calls per year.
 */
import { tzOffset } from '@date-fns/tz';

const DAY_MS = 86_400_000;
const MINUTE_MS = 60_000;

interface Segment {
  readonly fromMs: number;
  readonly offsetMin: number;
}

function offsetAt(zone: string, ms: number): number {
  return tzOffset(zone, new Date(ms));
}

/** The instant of the first offset after `lo` (offset at lo differs from offset at hi), to the second. */
function findChange(zone: string, lo: number, hi: number): number {
  const before = offsetAt(zone, lo);
  while (hi - lo > 1000) {
    const mid = Math.floor((lo + hi) / 2000) * 1000;
    if (offsetAt(zone, mid) === before) lo = mid;
    else hi = mid;
  }
  return hi;
}

function segments(zone: string, startMs: number, endMs: number): Segment[] {
  const list: Segment[] = [{ fromMs: -Infinity, offsetMin: offsetAt(zone, startMs) }];
  let prevMs = startMs;
  let prev = list[0]!.offsetMin;
  for (let ms = startMs + DAY_MS; ; ms += DAY_MS) {
    const at = Math.min(ms, endMs);
    const offset = offsetAt(zone, at);
    if (offset !== prev) {
      // At most one change per day in every zone we know of.
      list.push({ fromMs: findChange(zone, prevMs, at), offsetMin: offset });
      prev = offset;
    }
    prevMs = at;
    if (at >= endMs) break;
  }
  return list;
}

export interface LocalClock {
  /** UTC offset in minutes per step. */
  readonly offsetMin: Int32Array;
  /** Local calendar day number (days since 1970-01-01 in local time) per step. */
  readonly localDay: Int32Array;
  /** Minutes since local midnight at the start of each step. */
  readonly minuteOfDay: Int32Array;
}

/** Local clock facts for the instants `timesMs` (ascending). */
export function localClock(zone: string, timesMs: readonly number[]): LocalClock {
  const n = timesMs.length;
  const out: LocalClock = { offsetMin: new Int32Array(n), localDay: new Int32Array(n), minuteOfDay: new Int32Array(n) };
  if (n === 0) return out;
  const segs = segments(zone, timesMs[0]!, timesMs[n - 1]!);
  let s = 0;
  for (let t = 0; t < n; t++) {
    const ms = timesMs[t]!;
    while (s + 1 < segs.length && segs[s + 1]!.fromMs <= ms) s++;
    const offset = segs[s]!.offsetMin;
    const local = ms + offset * MINUTE_MS;
    const day = Math.floor(local / DAY_MS);
    out.offsetMin[t] = offset;
    out.localDay[t] = day;
    out.minuteOfDay[t] = Math.round((local - day * DAY_MS) / MINUTE_MS);
  }
  return out;
}

/** Weekday of a local day number: 0 Sunday … 6 Saturday (1970-01-01 was a Thursday). */
export function weekdayOf(localDay: number): number {
  return (((localDay + 4) % 7) + 7) % 7;
}

export function localDateLabel(localDay: number): string {
  return new Date(localDay * DAY_MS).toISOString().slice(0, 10);
}

export function clockLabel(minuteOfDay: number): string {
  const h = Math.floor(minuteOfDay / 60);
  const m = minuteOfDay % 60;
  return `${String(h).padStart(2, '0')}:${String(m).padStart(2, '0')}`;
}

/** An instant as the site's wall time with its offset, e.g. "2026-05-07 17:00 +02:00" (the form the app shows). */
export function localTimeLabel(zone: string, ms: number): string {
  const offset = tzOffset(zone, new Date(ms));
  if (!Number.isFinite(offset)) return new Date(ms).toISOString();
  const local = new Date(ms + offset * MINUTE_MS).toISOString();
  const abs = Math.abs(offset);
  const pad = (v: number) => String(v).padStart(2, '0');
  return `${local.slice(0, 10)} ${local.slice(11, 16)} ${offset < 0 ? '-' : '+'}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`;
}
