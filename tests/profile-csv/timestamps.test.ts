/**
 * Timestamp cells: every RFC 3339 time names the instant the ECMAScript date
 * parser gives for it (an independent reader of the same format, ECMA-262
 * "Date Time String Format"), and the fast path for common layouts agrees with
 * the full pattern used for the rest (a ".000" fraction forces the pattern).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseTimestamp } from '../../shared/profile-csv/parse-timestamp';

const pad = (n: number, width = 2): string => String(n).padStart(width, '0');

const offsetText = fc.oneof(
  fc.constant('Z'),
  fc
    .record({ sign: fc.constantFrom('+', '-'), h: fc.integer({ min: 0, max: 14 }), m: fc.constantFrom(0, 15, 30, 45) })
    .map(({ sign, h, m }) => `${sign}${pad(h)}:${pad(m)}`),
);

describe('reads RFC 3339 times as ECMAScript does', () => {
  it('gives the same instant as Date.parse for valid times with offsets', () => {
    fc.assert(
      fc.property(
        fc.record({
          year: fc.integer({ min: 1900, max: 2199 }),
          month: fc.integer({ min: 1, max: 12 }),
          // Days 1-28 exist in every month, so these cells are all valid [S: Gregorian calendar].
          day: fc.integer({ min: 1, max: 28 }),
          hour: fc.integer({ min: 0, max: 23 }),
          minute: fc.integer({ min: 0, max: 59 }),
          second: fc.integer({ min: 0, max: 59 }),
          offset: offsetText,
        }),
        (t) => {
          const cell = `${pad(t.year, 4)}-${pad(t.month)}-${pad(t.day)}T${pad(t.hour)}:${pad(t.minute)}:${pad(t.second)}${t.offset}`;
          const reading = parseTimestamp(cell);
          if (!reading.ok) throw new Error(reading.reason);
          expect(reading.wallMs - (reading.offsetMinutes ?? 0) * 60_000).toBe(Date.parse(cell));
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe('fast path and full pattern agree', () => {
  it('gives the same reading with and without a .000 fraction, valid or not', () => {
    fc.assert(
      fc.property(
        fc.record({
          year: fc.integer({ min: 1800, max: 2300 }),
          month: fc.integer({ min: 0, max: 13 }),
          day: fc.integer({ min: 0, max: 32 }),
          hour: fc.integer({ min: 0, max: 25 }),
          minute: fc.integer({ min: 0, max: 60 }),
          second: fc.integer({ min: 0, max: 60 }),
          separator: fc.constantFrom('T', 't', ' '),
          offset: fc.oneof(offsetText, fc.constantFrom('', 'z', '+24:00', '-00:00', '+01:60')),
        }),
        (t) => {
          const head = `${pad(t.year, 4)}-${pad(t.month)}-${pad(t.day)}${t.separator}${pad(t.hour)}:${pad(t.minute)}:${pad(t.second)}`;
          const fast = parseTimestamp(`${head}${t.offset}`);
          const pattern = parseTimestamp(`${head}.000${t.offset}`);
          expect(fast.ok).toBe(pattern.ok);
          if (fast.ok && pattern.ok) expect(fast).toEqual(pattern);
          if (!fast.ok && !pattern.ok) expect(fast.reason.replace(head, '')).toBe(pattern.reason.replace(`${head}.000`, ''));
        },
      ),
      { numRuns: 1000 },
    );
  });

  it('reads 24:00 as the end of the day and -00:00 as UTC', () => {
    // ISO 8601 end-of-day 24:00; RFC 3339 section 4.3 on -00:00.
    const end = parseTimestamp('2026-12-31T24:00:00+01:00');
    expect(end.ok && end.wallMs - (end.offsetMinutes ?? 0) * 60_000).toBe(Date.parse('2027-01-01T00:00:00+01:00'));
    expect(parseTimestamp('2026-01-01T10:00:00-00:00')).toEqual({
      ok: true,
      wallMs: Date.parse('2026-01-01T10:00:00Z'),
      offsetMinutes: 0,
    });
    expect(parseTimestamp('2026-01-01T24:30:00Z')).toMatchObject({ ok: false, reason: expect.stringMatching(/hour 24/) });
  });
});
