/**
 * Numbers, money, durations and instants as plan and study pages show them.
 * Instants are shown in the site's zone with the UTC offset, so DST days read
 * unambiguously; wall times typed in a form map back to instants the same way.
 */
import { createZoneClock, formatInstant } from '@shared/profile-csv';
import { format } from 'date-fns';
import { displayLocale } from './number-format';

const clocks = new Map<string, ReturnType<typeof createZoneClock>>();

/** One clock per zone: a table of a year of 5-minute values formats 100 000 instants. */
function zoneClock(timeZone: string) {
  let clock = clocks.get(timeZone);
  if (clock === undefined) {
    clock = createZoneClock(timeZone);
    clocks.set(timeZone, clock);
  }
  return clock;
}

/** "2026-05-04 17:00 +02:00" in `timeZone` (UTC text when the zone is unknown). */
export function formatLocalTime(ms: number, timeZone: string): string {
  const clock = zoneClock(timeZone);
  if (!clock) return new Date(ms).toISOString();
  const text = formatInstant(ms, clock);
  return `${text.slice(0, 10)} ${text.slice(11, 16)} ${text.slice(19)}`;
}

/** "2026-05-04T17:00" (for datetime-local inputs) in `timeZone`. */
export function toWallTimeInput(ms: number, timeZone: string): string {
  const clock = zoneClock(timeZone);
  return clock ? formatInstant(ms, clock).slice(0, 16) : new Date(ms).toISOString().slice(0, 16);
}

/**
 * The instant a wall time names in `timeZone`: null when the text is empty or
 * the time does not exist (spring forward); the earlier one when it is repeated.
 */
export function fromWallTimeInput(text: string, timeZone: string): number | null {
  if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/.test(text)) return null;
  const clock = zoneClock(timeZone);
  const wall = Date.parse(`${text}:00Z`);
  if (!clock) return wall;
  return clock.instantsOf(wall)[0] ?? null;
}

const shown = (n: number | null | undefined): n is number => n !== null && n !== undefined && Number.isFinite(n);

/** Up to `digits` decimals, in the person's number format ("4,000", "0.92"). */
export const formatNumber = (n: number | null | undefined, digits = 1) =>
  shown(n) ? n.toLocaleString(displayLocale(), { maximumFractionDigits: digits, minimumFractionDigits: 0 }) : '–';

/** Exactly `digits` decimals, for columns of figures that line up ("4,000.0", "12.5" → "12.50"); -0 shows as 0. */
export const formatFixed = (n: number | null | undefined, digits: number) =>
  shown(n)
    ? (Math.abs(n) < 0.5 * 10 ** -digits ? 0 : n).toLocaleString(displayLocale(), {
        maximumFractionDigits: digits,
        minimumFractionDigits: digits,
      })
    : '–';

/** A count: "8,760". */
export const formatCount = (n: number | null | undefined) => formatFixed(n, 0);

export const formatMoney = (n: number | null | undefined, currency: string) =>
  shown(n) ? `${formatFixed(n, 2)}${currency ? ` ${currency}` : ''}` : '–';

export const formatPercent = (share: number | null | undefined, digits = 0) =>
  shown(share) ? `${formatFixed(share * 100, digits)} %` : '–';

/**
 * An efficiency (a fraction) as every page states it: in % with one decimal, e.g. 0.922 → "92.2 %".
 * A round trip is the product of the charging and discharging efficiencies.
 */
export const formatEfficiency = (fraction: number | null | undefined) => formatPercent(fraction, 1);

/** "350 ms", "4.2 s", "45 s", "3 min", "1 h 20 min". */
export function formatDuration(seconds: number | null | undefined): string {
  if (seconds === null || seconds === undefined || !Number.isFinite(seconds)) return '–';
  // The exact path solves in milliseconds: "1 s" would hide a thousandfold difference.
  if (seconds < 1) return `${Math.max(1, Math.round(seconds * 1000))} ms`;
  if (seconds < 10) return `${formatFixed(seconds, 1)} s`;
  if (seconds < 60) return `${Math.round(seconds)} s`;
  const minutes = Math.round(seconds / 60);
  if (minutes < 60) return `${minutes} min`;
  return `${Math.floor(minutes / 60)} h ${minutes % 60} min`;
}

/** Steps as hours or minutes: "5 h", "45 min". */
export function formatSteps(steps: number, stepMinutes: number): string {
  const minutes = steps * stepMinutes;
  return minutes % 60 === 0 ? `${minutes / 60} h` : minutes > 60 ? `${formatFixed(minutes / 60, 1)} h` : `${minutes} min`;
}

/**
 * When something happened (an upload, a sign-off, an e-mail), in the browser's own zone, written like
 * every other time in the app: "2026-12-01 23:16 +01:00". Seconds on request (audit trail, history).
 */
export function formatMoment(iso: string | number, withSeconds = false): string {
  return format(new Date(iso), withSeconds ? 'yyyy-MM-dd HH:mm:ss xxx' : 'yyyy-MM-dd HH:mm xxx');
}
