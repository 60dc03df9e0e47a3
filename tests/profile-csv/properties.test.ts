/**
 * Property tests (fast-check): no input makes the parser throw, and any valid
 * regular series written out as CSV, in any of the accepted styles, reads back
 * exactly.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decodeProfileBytes } from '../../shared/profile-csv/decode-profile-bytes';
import { parseProfileCsv, type ParseProfileResult } from '../../shared/profile-csv/parse-profile-csv';
import { PRICE } from './support';

function expectWellFormed(result: ParseProfileResult): void {
  if (result.ok) {
    expect(result.profile.values.every(Number.isFinite)).toBe(true);
    return;
  }
  expect(result.issues.length).toBeGreaterThan(0);
  for (const issue of result.issues) {
    expect(Number.isInteger(issue.line) && issue.line >= 0).toBe(true);
    expect(issue.message.length).toBeGreaterThan(0);
  }
  expect(result.hint).toMatch(/Nothing was stored/);
}

// Pieces that reach deep into the parser: times (valid, DST-day local, broken),
// numbers (incl. non-finite and decimal commas), delimiters, quotes, line ends.
const piece = fc.oneof(
  fc.constantFrom('time', 'price', 'value', ',', ';', '"', '""', '\n', '\r\n', '\r', ' ', '\t', '\uFEFF', '\u0000'),
  fc.constantFrom(
    '2026-10-25T02:00',
    '2026-03-29T02:30',
    '2026-01-01T00:00:00+01:00',
    '2026-01-01T00:15Z',
    '2026-02-30T00:00',
    '24:00',
    '+14:00',
  ),
  fc.constantFrom('NaN', 'Infinity', '1e309', '-0', '1,5', '1.5e-3', '-500'),
  fc.integer({ min: -1000, max: 1000 }).map(String),
  fc.string({ maxLength: 8 }),
);
const csvLike = fc.array(piece, { maxLength: 60 }).map((parts) => parts.join(''));

describe('never throws, whatever the input', () => {
  it('returns a result for random strings of any characters', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 400 }), fc.boolean(), fc.boolean(), (text, fillGaps, intervalEnding) => {
        expectWellFormed(parseProfileCsv(text, { ...PRICE, fillGaps, intervalEnding }));
      }),
      { numRuns: 300 },
    );
  });

  it('returns a result for random bytes decoded as an upload', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 400 }), (bytes) => {
        expectWellFormed(parseProfileCsv(decodeProfileBytes(bytes), PRICE));
      }),
      { numRuns: 300 },
    );
  });

  it('returns a result for CSV-like text built from times, numbers and delimiters', () => {
    fc.assert(
      fc.property(
        csvLike,
        fc.boolean(),
        fc.constantFrom('Europe/Berlin', 'America/New_York', 'UTC'),
        (text, fillGaps, timezone) => {
          expectWellFormed(parseProfileCsv(text, { ...PRICE, fillGaps, timezone }));
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe('round-trips any valid regular series', () => {
  const STEPS = [5, 15, 30, 60] as const;
  const series = fc.record({
    // Aligned starts between 2020 and 2030, in whole steps of 5 minutes.
    startSlot: fc.integer({ min: 0, max: 10 * 365 * 288 }),
    step: fc.constantFrom(...STEPS),
    values: fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }), { minLength: 2, maxLength: 80 }),
    offsetMinutes: fc.constantFrom(0, 60, -300, 330),
    semicolon: fc.boolean(),
    crlf: fc.boolean(),
    bom: fc.boolean(),
    intervalEnding: fc.boolean(),
  });

  it('reads back the start, step and every value exactly', () => {
    fc.assert(
      fc.property(series, (s) => {
        const startMs = Date.UTC(2020, 0, 1) + s.startSlot * 5 * 60_000;
        const stepMs = s.step * 60_000;
        const sign = s.offsetMinutes < 0 ? '-' : '+';
        const abs = Math.abs(s.offsetMinutes);
        const offset =
          s.offsetMinutes === 0
            ? 'Z'
            : `${sign}${String(Math.floor(abs / 60)).padStart(2, '0')}:${String(abs % 60).padStart(2, '0')}`;
        const delimiter = s.semicolon ? ';' : ',';
        const lines = [`time${delimiter}price`];
        s.values.forEach((v, i) => {
          const labelMs = startMs + (i + (s.intervalEnding ? 1 : 0)) * stepMs;
          const wall = new Date(labelMs + s.offsetMinutes * 60_000).toISOString().slice(0, 19);
          // String(v) is the shortest text that reads back to the same double [S: ECMA-262 Number::toString].
          const text = s.semicolon ? String(v).replace('.', ',') : String(v);
          lines.push(`${wall}${offset}${delimiter}${text}`);
        });
        const file = `${s.bom ? '\uFEFF' : ''}${lines.join(s.crlf ? '\r\n' : '\n')}`;
        // UTC as the site zone: a fixed offset is then consistent and valid.
        const result = parseProfileCsv(file, { ...PRICE, timezone: 'UTC', intervalEnding: s.intervalEnding });
        if (!result.ok) throw new Error(JSON.stringify(result.issues));
        expect(result.profile.startMs).toBe(startMs);
        expect(result.profile.stepMinutes).toBe(s.step);
        expect(result.profile.values).toEqual(s.values.map((v) => (v === 0 ? 0 : v)));
        expect(result.profile.filledIndexes).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });
});
