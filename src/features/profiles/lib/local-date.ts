import { createZoneClock } from '@shared/profile-csv';

/**
 * RFC 3339 instant of local midnight of `date` (yyyy-mm-dd) in `timeZone`, for
 * the `?from&to` window. A midnight skipped by a DST change (rare; some zones
 * change at 00:00) falls back to the first instant after it.
 */
export function localMidnight(date: string, timeZone: string): string | undefined {
  const wall = Date.parse(`${date}T00:00:00Z`);
  const clock = createZoneClock(timeZone);
  if (Number.isNaN(wall) || !clock) return undefined;
  const [first] = clock.instantsOf(wall);
  const instant = first ?? clock.instantsOf(wall + 3_600_000)[0] ?? wall;
  return new Date(instant).toISOString();
}
