/** Times in the site's zone with their UTC offset (RFC 3339 style), and plain numbers. */
import { createZoneClock, formatInstant } from '@shared/profile-csv';

const clocks = new Map<string, ReturnType<typeof createZoneClock>>();

/** "2026-05-04 00:00 +02:00": local wall time in `timeZone`, offset kept so DST days read unambiguously. */
export function formatLocal(ms: number, timeZone: string): string {
  let clock = clocks.get(timeZone);
  if (clock === undefined) {
    clock = createZoneClock(timeZone);
    clocks.set(timeZone, clock);
  }
  if (!clock) return new Date(ms).toISOString();
  const text = formatInstant(ms, clock);
  return `${text.slice(0, 10)} ${text.slice(11, 16)} ${text.slice(19)}`;
}

export const formatNumber = (n: number, digits = 3) => n.toLocaleString(undefined, { maximumFractionDigits: digits });

export function describeStep(minutes: number): string {
  return minutes % 60 === 0 ? `${minutes / 60} h` : `${minutes} min`;
}

/** The unit as shown: prices in the site's currency. */
export const displayUnit = (unit: string, currency: string) => unit.replace('currency', currency);
