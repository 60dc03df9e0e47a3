/**
 * Files that write dates day or month first, or numbers with thousands separators, are read
 * only when the upload declares the date order (`dateOrder`) and the decimal separator
 * (`decimalSeparator`); without them such files are refused with what to choose. Expected
 * instants are RFC 3339 literals read with Date.parse, independently of the parser.
 */
import { describe, expect, it } from 'vitest';
import { accepted, at, csv, expectIssues, rejected } from './support';

describe('date order declared at upload', () => {
  const dayFirst = csv('time;price', '08.12.2026 00:00;41,5', '08.12.2026 01:00;40,25', '08.12.2026 02:00;39');

  it('reads day-first dates in the site zone when the file is declared day-month-year', () => {
    const profile = accepted(dayFirst, { dateOrder: 'dmy' });
    // [D] 08.12.2026 read day first is 8 December 2026, local midnight in Berlin (+01:00 in winter).
    expect(profile.startMs).toBe(at('2026-12-08T00:00:00+01:00'));
    expect(profile.stepMinutes).toBe(60);
    expect(profile.values).toEqual([41.5, 40.25, 39]);
    expect(profile.notes.join(' ')).toMatch(/read day first \(day-month-year.*as chosen/);
  });

  it('reads the same text as 12 August when the file is declared month-day-year', () => {
    // [D] month first, 08.12.2026 is the 12th of August (summer time, +02:00 in Berlin).
    expect(accepted(dayFirst, { dateOrder: 'mdy' }).startMs).toBe(at('2026-08-12T00:00:00+02:00'));
  });

  it('reads US dates with a 12-hour clock when declared month-day-year', () => {
    const profile = accepted(csv('time,price', '12/08/2026 11:00 AM,10', '12/08/2026 12:00 PM,11', '12/08/2026 1:00 PM,12'), {
      dateOrder: 'mdy',
    });
    // [S] 12 PM is noon and 1 PM is 13:00 on the 12-hour clock (NIST Time and Frequency FAQ, "12 a.m. and 12 p.m.").
    expect(profile.startMs).toBe(at('2026-12-08T11:00:00+01:00'));
    expect(profile.values).toEqual([10, 11, 12]);
  });

  it('still reads ISO 8601 times in a file with a declared date order', () => {
    const profile = accepted(csv('time,price', '2026-12-08T00:00:00+01:00,1', '2026-12-08T01:00:00+01:00,2'), {
      dateOrder: 'dmy',
    });
    expect(profile.startMs).toBe(at('2026-12-08T00:00:00+01:00'));
  });

  it('refuses day- or month-first dates without a declared order, saying what to choose', () => {
    const { issues, hint } = rejected(dayFirst);
    expect(issues).toHaveLength(3);
    expect(issues[0]?.message).toMatch(/"08\.12\.2026 00:00" is not an ISO 8601 date.*choose the file's date order at upload/);
    expect(hint).toMatch(/choose the file's date order at upload/);
    // Under a header that names no time, the first row's cell still tells what to choose.
    const { issues: unnamed } = rejected(csv('Zeit;Preis', '08.12.2026 00:00;41,5', '08.12.2026 01:00;40'));
    expect(unnamed[0]?.message).toMatch(/column 1 \("Zeit"\) holds "08\.12\.2026 00:00".*Choose the file's date order/);
    expect(accepted(csv('Zeit;Preis', '08.12.2026 00:00;41,5', '08.12.2026 01:00;40'), { dateOrder: 'dmy' }).values).toEqual([
      41.5, 40,
    ]);
  });

  it('refuses a date that does not exist in the declared order, and two-digit years', () => {
    expectIssues(
      csv('time;price', '31.02.2026 00:00;1', '01.03.2026 01:00;2', '01.03.26 02:00;3'),
      [
        [2, /has day 31 \(read as day-month-year\), which does not exist in 2026-02/],
        [4, /two-digit year; write the year with four digits/],
      ],
      { dateOrder: 'dmy' },
    );
  });
});

describe('decimal separator declared at upload', () => {
  it('reads a decimal comma with points between thousands, as in 1.010,25', () => {
    const profile = accepted(
      csv(
        'time;load',
        '2026-01-01T00:00:00+01:00;1.010,25',
        '2026-01-01T01:00:00+01:00;-2.000.000,5',
        '2026-01-01T02:00:00+01:00;7',
      ),
      { kind: 'load', unit: 'kW', decimalSeparator: ',' },
    );
    // [D] 1.010,25 = 1010.25; -2.000.000,5 = -2000000.5.
    expect(profile.values).toEqual([1010.25, -2_000_000.5, 7]);
    expect(profile.notes[0]).toMatch(/decimal comma and points between thousands, as chosen/);
  });

  it('reads a decimal point with commas between thousands in quoted fields of a comma-separated file', () => {
    const profile = accepted(
      csv('time,load', '2026-01-01T00:00:00+01:00,"1,010.25"', '2026-01-01T01:00:00+01:00,12.5', '2026-01-01T02:00:00+01:00,3'),
      { kind: 'load', unit: 'kW', decimalSeparator: '.' },
    );
    expect(profile.values).toEqual([1010.25, 12.5, 3]);
  });

  it('refuses numbers written in the other format instead of guessing', () => {
    expectIssues(
      csv('time;price', '2026-01-01T00:00:00+01:00;1,010.25', '2026-01-01T01:00:00+01:00;12,34', '2026-01-01T02:00:00+01:00;3'),
      [[2, /"1,010\.25" is written with a decimal point; .*If you meant 1010,25, write 1010,25.*as chosen/]],
      { decimalSeparator: ',' },
    );
  });

  it('refuses a row whose decimal comma split the value in a comma-separated file', () => {
    // Unquoted, "12,5" is two fields: reading "12" would store a wrong price.
    expectIssues(csv('time,price', '2026-01-01T00:00:00+01:00,12,5', '2026-01-01T01:00:00+01:00,11'), [
      [2, /has 3 fields but the header has 2.*put it in quotes/],
    ]);
  });

  it('refuses an unknown option on the form line', () => {
    expectIssues(csv('time,price', '2026-01-01T00:00:00+01:00,1', '2026-01-01T01:00:00+01:00,2'), [[0, /date order "ymd"/]], {
      dateOrder: 'ymd' as 'dmy',
    });
  });
});
