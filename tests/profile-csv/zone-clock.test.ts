/**
 * Local wall time → instants in an IANA zone, on both DST days of
 * Europe/Berlin and America/New_York in 2026. Expected instants follow from the
 * published rules, not from the code under test:
 * - EU: summer time from 01:00 UTC on the last Sunday of March to 01:00 UTC on
 *   the last Sunday of October [S: Directive 2000/84/EC, Articles 2-3]:
 *   2026-03-29 and 2026-10-25 [D: 2026-03-01 and 2026-10-04 are Sundays].
 * - US: from 02:00 local standard time on the second Sunday of March to 02:00
 *   local daylight time on the first Sunday of November [S: Energy Policy Act
 *   of 2005, section 110; 15 U.S.C. 260a]: 2026-03-08 and 2026-11-01.
 */
import { describe, expect, it } from 'vitest';
import { createZoneClock, formatInstant, type ZoneClock } from '../../shared/profile-csv/zone-clock';
import { at } from './support';

const wall = (local: string): number => Date.parse(`${local}Z`);

function clockOf(zone: string): ZoneClock {
  const clock = createZoneClock(zone);
  if (clock === null) throw new Error(`${zone} unknown to this runtime`);
  return clock;
}

const cases: [zone: string, local: string, instants: string[]][] = [
  // Berlin spring: 02:00 CET becomes 03:00 CEST, so 02:00-02:59 do not exist.
  ['Europe/Berlin', '2026-03-29T01:59:00', ['2026-03-29T00:59:00Z']],
  ['Europe/Berlin', '2026-03-29T02:00:00', []],
  ['Europe/Berlin', '2026-03-29T02:45:00', []],
  ['Europe/Berlin', '2026-03-29T03:00:00', ['2026-03-29T01:00:00Z']],
  // Berlin autumn: 03:00 CEST becomes 02:00 CET, so 02:00-02:59 happen twice.
  ['Europe/Berlin', '2026-10-25T01:59:00', ['2026-10-24T23:59:00Z']],
  ['Europe/Berlin', '2026-10-25T02:00:00', ['2026-10-25T00:00:00Z', '2026-10-25T01:00:00Z']],
  ['Europe/Berlin', '2026-10-25T02:59:00', ['2026-10-25T00:59:00Z', '2026-10-25T01:59:00Z']],
  ['Europe/Berlin', '2026-10-25T03:00:00', ['2026-10-25T02:00:00Z']],
  // New York spring: 02:00 EST becomes 03:00 EDT.
  ['America/New_York', '2026-03-08T01:59:00', ['2026-03-08T06:59:00Z']],
  ['America/New_York', '2026-03-08T02:30:00', []],
  ['America/New_York', '2026-03-08T03:00:00', ['2026-03-08T07:00:00Z']],
  // New York autumn: 02:00 EDT becomes 01:00 EST, so 01:00-01:59 happen twice.
  ['America/New_York', '2026-11-01T00:59:00', ['2026-11-01T04:59:00Z']],
  ['America/New_York', '2026-11-01T01:00:00', ['2026-11-01T05:00:00Z', '2026-11-01T06:00:00Z']],
  ['America/New_York', '2026-11-01T01:30:00', ['2026-11-01T05:30:00Z', '2026-11-01T06:30:00Z']],
  ['America/New_York', '2026-11-01T02:00:00', ['2026-11-01T07:00:00Z']],
];

describe('maps a local wall time to 0, 1 or 2 instants on DST days', () => {
  it.each(cases)('%s %s → %j', (zone, local, instants) => {
    expect(clockOf(zone).instantsOf(wall(local))).toEqual(instants.map(at));
  });
});

describe('gives the offset in force at an instant', () => {
  it.each([
    ['Europe/Berlin', '2026-03-29T00:59:59Z', 60],
    ['Europe/Berlin', '2026-03-29T01:00:00Z', 120],
    ['Europe/Berlin', '2026-10-25T00:59:59Z', 120],
    ['Europe/Berlin', '2026-10-25T01:00:00Z', 60],
    ['America/New_York', '2026-03-08T06:59:59Z', -300],
    ['America/New_York', '2026-03-08T07:00:00Z', -240],
    ['America/New_York', '2026-11-01T05:59:59Z', -240],
    ['America/New_York', '2026-11-01T06:00:00Z', -300],
  ] as const)('%s at %s is %i minutes', (zone, instant, offset) => {
    expect(clockOf(zone).offsetAt(at(instant))).toBe(offset);
  });

  it('formats the repeated Berlin hour with its two offsets, in chronological order', () => {
    // [S: time series conventions, docs/sources.md] the repeated hour appears twice with different offsets.
    const clock = clockOf('Europe/Berlin');
    expect([formatInstant(at('2026-10-25T00:30:00Z'), clock), formatInstant(at('2026-10-25T01:30:00Z'), clock)]).toEqual([
      '2026-10-25T02:30:00+02:00',
      '2026-10-25T02:30:00+01:00',
    ]);
  });

  it('refuses a zone name the runtime does not know', () => {
    expect(createZoneClock('Not/AZone')).toBeNull();
  });
});
