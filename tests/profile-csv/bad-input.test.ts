/**
 * Every bad upload the upload rules name is rejected with the
 * physical line of the file, a message saying what is wrong and how to fix it,
 * and the general hint. Line numbers below are counted by hand from the
 * literal files [D: line 1 is the header unless stated].
 */
import { describe, expect, it } from 'vitest';
import { decodeProfileBytes } from '../../shared/profile-csv/decode-profile-bytes';
import { parseProfileCsv } from '../../shared/profile-csv/parse-profile-csv';
import { PRICE, csv, expectIssues, rejected } from './support';

describe('rejects files that are not a profile at all', () => {
  it('rejects an empty file on line 1', () => {
    expectIssues('', [[1, /file is empty/]]);
  });

  it('rejects a file of blank lines as empty', () => {
    expectIssues('\n  \r\n\n', [[1, /file is empty/]]);
  });

  it('rejects a header with no data rows below it', () => {
    expectIssues(csv('time,price'), [[1, /header row \(line 1\) but no data rows/]]);
  });

  it('rejects a file whose first line is data instead of a header', () => {
    expectIssues(csv('2026-01-01T00:00:00+01:00,10', '2026-01-01T01:00:00+01:00,11'), [[1, /needs a header row.*time,value/]]);
  });

  it('rejects a file with no timestamp column, naming the headers it saw', () => {
    expectIssues(csv('site,price', 'north,10', 'north,11'), [[1, /no timestamp column.*"site", "price"/]]);
  });

  it('rejects a tab-separated file, which has a single column for comma/semicolon', () => {
    expectIssues(csv('time\tprice', '2026-01-01T00:00Z\t1'), [[1, /single column.*tabs are not accepted/]]);
  });

  it('rejects a file with a single data row: the resolution cannot be told', () => {
    expectIssues(csv('time,price', '2026-01-01T00:00:00+01:00,10'), [[2, /only data row/]]);
  });
});

describe('rejects binary content as not a CSV text file', () => {
  it('rejects NUL bytes, naming their line', () => {
    const text = csv('time,price', '2026-01-01T00:00:00+01:00,10', '2026-01-01T01:00\u0000\u0000,11');
    expectIssues(text, [[3, /control bytes \(such as NUL\).*not a CSV text file/]]);
  });

  it('rejects a ZIP archive (a spreadsheet) renamed .csv', () => {
    // A ZIP local file header starts with the bytes 50 4B 03 04 [S: PKWARE APPNOTE.TXT, section 4.3.7].
    const bytes = new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00, 0x08, 0x00, 0xa3, 0xff, 0x10]);
    expectIssues(decodeProfileBytes(bytes), [[1, /not a CSV text file/]]);
  });

  it('rejects bytes that are not valid UTF-8, on the line where they occur', () => {
    // 0xFF never occurs in UTF-8 [S: RFC 3629 section 1]; the decoder writes U+FFFD for it.
    const head = new TextEncoder().encode(csv('time,price', '2026-01-01T00:00:00+01:00,10', '2026-01-01T01:00:00+01:00,'));
    const bytes = new Uint8Array([...head.subarray(0, head.length - 1), 0xff, 0xfe, 0x0a]);
    expectIssues(decodeProfileBytes(bytes), [[3, /not valid UTF-8.*Save the data as CSV \(UTF-8\)/]]);
  });

  it('rejects a UTF-16 file (NUL between ASCII letters) on line 1', () => {
    // UTF-16LE writes "t" as 74 00 [S: RFC 2781 section 2]; read as UTF-8 those zero bytes are NULs.
    const utf16 = new Uint8Array([0xff, 0xfe, 0x74, 0x00, 0x69, 0x00, 0x6d, 0x00, 0x65, 0x00]);
    expectIssues(decodeProfileBytes(utf16), [[1, /not a CSV text file/]]);
  });
});

describe('rejects unreadable times and values, naming each line', () => {
  it('rejects a time that is not ISO 8601 and shows the accepted forms', () => {
    const text = csv('time,price', '2026-01-01T00:00:00+01:00,10', '01.01.2026 01:00,11', '2026-01-01T02:00:00+01:00,12');
    expectIssues(text, [[3, /"01\.01\.2026 01:00" is not an ISO 8601 date and time.*2026-01-01T00:00:00\+01:00/]]);
  });

  it('rejects a calendar date that does not exist', () => {
    // 2026 is not a leap year, so February has 28 days [S: Gregorian calendar rule].
    const text = csv('time,price', '2026-02-28T23:00:00+01:00,10', '2026-02-29T00:00:00+01:00,11');
    expectIssues(text, [[3, /day 29, which does not exist in 2026-02/]]);
  });

  it('rejects a time with a date but no time of day', () => {
    expectIssues(csv('time,price', '2026-01-01,10', '2026-01-02,11'), [
      [2, /has a date but no time of day/],
      [3, /has a date but no time of day/],
    ]);
  });

  it('rejects a value that is not a number', () => {
    const text = csv('time,price', '2026-01-01T00:00:00+01:00,10', '2026-01-01T01:00:00+01:00,12 EUR');
    expectIssues(text, [[3, /"12 EUR" is not a number in "price".*plain number/]]);
  });

  it('rejects a decimal comma in a comma-separated file, pointing to semicolons', () => {
    const text = csv('time,price', '2026-01-01T00:00:00+01:00,"10,5"', '2026-01-01T01:00:00+01:00,11');
    expectIssues(text, [[2, /decimal comma.*only in semicolon-separated files/]]);
  });

  it('rejects thousands separators rather than guessing them', () => {
    const text = csv('time;price', '2026-01-01T00:00:00+01:00;1.234,5', '2026-01-01T01:00:00+01:00;11');
    expectIssues(text, [[2, /"1\.234,5" is not a number/]]);
  });

  it.each([
    ['NaN', /"NaN" is not a finite number/],
    ['Infinity', /"Infinity" is not a finite number/],
    ['-inf', /"-inf" is not a finite number/],
    // The largest double is about 1.7977e308, so 1e309 rounds to Infinity [S: IEEE 754-2019 binary64; ECMA-262 Number.MAX_VALUE].
    ['1e309', /"1e309" is too large to be a finite number/],
  ])('rejects the non-finite value %s', (value, pattern) => {
    const text = csv('time,price', `2026-01-01T00:00:00+01:00,${value}`, '2026-01-01T01:00:00+01:00,11');
    expectIssues(text, [[2, pattern]]);
  });

  it('rejects an empty value unless gap filling is on, and says so', () => {
    const text = csv('time,price', '2026-01-01T00:00:00+01:00,10', '2026-01-01T01:00:00+01:00,', '2026-01-01T02:00:00+01:00,12');
    expectIssues(text, [[3, /value in "price" is empty.*gap filling/]]);
  });

  it('rejects a row with too few fields', () => {
    const text = csv('time,price', '2026-01-01T00:00:00+01:00,10', '2026-01-01T01:00:00+01:00', '2026-01-01T02:00:00+01:00,12');
    expectIssues(text, [[3, /has 1 field but the header has 2/]]);
  });

  it('rejects an unclosed quote on the line where the field starts', () => {
    const text = csv(
      'time,price',
      '2026-01-01T00:00:00+01:00,10',
      '2026-01-01T01:00:00+01:00,"11',
      '2026-01-01T02:00:00+01:00,12',
    );
    const { issues } = rejected(text);
    expect(issues[0]).toEqual({ line: 3, message: expect.stringMatching(/quoted field whose quotes do not match/) });
  });
});

describe('rejects series that are not one regular series', () => {
  it('rejects a duplicate timestamp, naming both lines', () => {
    const text = csv(
      'time,price',
      '2026-01-01T00:00:00+01:00,10',
      '2026-01-01T01:00:00+01:00,11',
      '2026-01-01T01:00:00+01:00,12',
      '2026-01-01T02:00:00+01:00,13',
    );
    expectIssues(text, [[4, /same interval as line 3 \(2026-01-01T01:00:00\+01:00\)/]]);
  });

  it('rejects the same instant written with two different offsets as a duplicate', () => {
    // 01:00+01:00 and 00:00Z name the same instant [S: RFC 3339 section 4.2, local offsets].
    const text = csv('time,price', '2026-01-01T00:00:00Z,10', '2026-01-01T01:00:00+01:00,11', '2026-01-01T01:00:00Z,12');
    expectIssues(text, [
      [3, /offset jumps from \+00:00 \(line 2\) to \+01:00/],
      [3, /same interval as line 2/],
      [4, /offset jumps from \+01:00 \(line 3\) to \+00:00/],
    ]);
  });

  it('rejects rows out of time order', () => {
    const text = csv(
      'time,price',
      '2026-01-01T00:00:00+01:00,10',
      '2026-01-01T02:00:00+01:00,12',
      '2026-01-01T01:00:00+01:00,11',
      '2026-01-01T03:00:00+01:00,13',
    );
    expectIssues(text, [[4, /earlier than line 3.*Sort the rows/]]);
  });

  it('rejects an irregular step at the stray row only', () => {
    const text = csv(
      'time,price',
      '2026-01-01T00:00:00+01:00,10',
      '2026-01-01T01:00:00+01:00,11',
      '2026-01-01T01:40:00+01:00,12',
      '2026-01-01T02:00:00+01:00,13',
      '2026-01-01T03:00:00+01:00,14',
    );
    expectIssues(text, [[4, /40 minutes after line 3.*not a whole number of 60-minute intervals/]]);
  });

  it('rejects a series whose step is not 5, 15, 30 or 60 minutes', () => {
    const text = csv('time,price', '2026-01-01T00:00Z,10', '2026-01-01T00:10Z,11', '2026-01-01T00:20Z,12');
    expectIssues(text, [[3, /10 minutes after line 2.*5, 15, 30 or 60 minute/]]);
  });

  it('rejects a gap, naming both sides and how many intervals are missing', () => {
    const text = csv(
      'time,price',
      '2026-01-01T00:00:00+01:00,10',
      '2026-01-01T00:15:00+01:00,11',
      '2026-01-01T01:00:00+01:00,14',
      '2026-01-01T01:15:00+01:00,15',
    );
    // 00:15 → 01:00 is 45 minutes = 3 steps of 15, so 2 intervals are missing [D].
    expectIssues(text, [
      [4, /45 minutes after line 3 \(2026-01-01T00:15:00\+01:00\), so 2 intervals of 15 minutes are missing.*gap filling/],
    ]);
  });

  it('rejects a blank first value even with gap filling: nothing to interpolate from', () => {
    const text = csv('time,price', '2026-01-01T00:00:00+01:00,', '2026-01-01T01:00:00+01:00,11');
    expectIssues(text, [[2, /first value is empty.*value before and after/]], { fillGaps: true });
  });
});

describe('rejects local times that daylight saving makes missing or ambiguous', () => {
  // Summer time starts and ends at 01:00 UTC on the last Sundays of March and October
  // [S: Directive 2000/84/EC, Articles 2-3]: 2026-03-29 and 2026-10-25 [D: 2026-03-01 is a Sunday].
  it('rejects a non-existent local time on the spring day in Europe/Berlin', () => {
    const text = csv('time,price', '2026-03-29T01:00,10', '2026-03-29T02:00,11', '2026-03-29T03:00,12');
    expectIssues(text, [[3, /2026-03-29T02:00 does not exist in Europe\/Berlin.*UTC\+01:00 to UTC\+02:00/]]);
  });

  it('rejects both occurrences of the repeated hour on the autumn day in Europe/Berlin', () => {
    // The repeated hour appears twice, in chronological order [S: time series conventions, docs/sources.md].
    const text = csv('time,price', '2026-10-25T01:00,10', '2026-10-25T02:00,11', '2026-10-25T02:00,12', '2026-10-25T03:00,13');
    const ambiguous =
      /2026-10-25T02:00 happens twice in Europe\/Berlin.*2026-10-25T02:00\+02:00 for the first and 2026-10-25T02:00\+01:00 for the second/;
    const { hint } = expectIssues(text, [
      [3, ambiguous],
      [4, ambiguous],
    ]);
    expect(hint).toMatch(/UTC offset \(RFC 3339\)/);
  });

  // US daylight time: second Sunday of March to first Sunday of November at 2:00 local
  // [S: Energy Policy Act of 2005, section 110; 15 U.S.C. 260a]: 2026-03-08 and 2026-11-01.
  it('rejects a non-existent local time on the spring day in America/New_York', () => {
    const text = csv('time,load', '2026-03-08T01:30,1', '2026-03-08T02:30,1', '2026-03-08T03:30,1');
    expectIssues(text, [[3, /does not exist in America\/New_York.*UTC-05:00 to UTC-04:00/]], {
      timezone: 'America/New_York',
      kind: 'load',
      unit: 'kW',
    });
  });

  it('rejects the repeated 01:00 hour on the autumn day in America/New_York', () => {
    const text = csv('time,load', '2026-11-01T00:30,1', '2026-11-01T01:30,1', '2026-11-01T01:30,1', '2026-11-01T02:30,1');
    expectIssues(
      text,
      [
        [3, /happens twice in America\/New_York/],
        [4, /happens twice/],
      ],
      { timezone: 'America/New_York', kind: 'load', unit: 'kW' },
    );
  });
});

describe('rejects UTC offsets that the site time zone cannot explain', () => {
  it('rejects an offset jump on a day with no DST change', () => {
    const text = csv(
      'time,price',
      '2026-01-10T00:00:00+01:00,10',
      '2026-01-10T01:00:00+01:00,11',
      '2026-01-10T03:00:00+02:00,12',
    );
    expectIssues(text, [[4, /jumps from \+01:00 \(line 3\) to \+02:00, but Europe\/Berlin stays at UTC\+01:00/]]);
  });

  it("rejects a jump made on another zone's DST day (US dates, Berlin site)", () => {
    // New York changes on 2026-03-08; Berlin not until 2026-03-29 [S: sources above].
    const text = csv('time,price', '2026-03-08T06:00:00-05:00,10', '2026-03-08T08:00:00-04:00,11');
    expectIssues(text, [[3, /jumps from -05:00 \(line 2\) to -04:00, but Europe\/Berlin stays at UTC\+01:00/]]);
  });

  it('rejects a mix of rows with and without offsets', () => {
    const text = csv('time,price', '2026-01-01T00:00:00+01:00,10', '2026-01-01T01:00,11');
    expectIssues(text, [[3, /has no UTC offset but line 2 has one/]]);
  });
});

describe('reports every problem at once, up to a cap', () => {
  it('lists problems of different kinds in line order', () => {
    const text = csv(
      'time,price',
      '2026-01-01T00:00:00+01:00,10',
      '2026-01-01T01:00:00+01:00,abc',
      'yesterday,12',
      '2026-01-01T03:00:00+01:00,NaN',
      '2026-01-01T03:00:00+01:00,14',
      '2026-01-01T06:00:00+01:00,15',
    );
    expectIssues(text, [
      [3, /"abc" is not a number/],
      [4, /"yesterday" is not an ISO 8601/],
      [5, /"NaN" is not a finite number/],
      [6, /same interval as line 5/],
      [7, /so 2 intervals of 60 minutes are missing/],
    ]);
  });

  it('keeps at most maxIssues problems and says how many there were', () => {
    const rows = Array.from(
      { length: 60 },
      (_, h) => `2026-01-0${1 + Math.floor(h / 24)}T${String(h % 24).padStart(2, '0')}:00:00+01:00,bad`,
    );
    const { issues, hint } = rejected(csv('time,price', ...rows), { maxIssues: 10 });
    expect(issues).toHaveLength(10);
    expect(issues[0]?.line).toBe(2);
    expect(hint).toMatch(/first 10 of 60 problems/);
  });

  it('caps at 50 problems by default', () => {
    const rows = Array.from({ length: 70 }, () => 'not a time,1');
    expect(rejected(csv('time,price', ...rows)).issues).toHaveLength(50);
  });
});

describe('keeps physical line numbers through BOMs, CRLF mixes and quoted newlines', () => {
  it('counts a quoted field spanning two lines as two physical lines', () => {
    const text = csv(
      'time,price,comment',
      '2026-01-01T00:00:00+01:00,10,"first line',
      'second line"',
      '2026-01-01T01:00:00+01:00,oops,ok',
    );
    expectIssues(text, [[4, /"oops" is not a number/]]);
  });

  it('counts lines the same with a BOM and a mix of CRLF, LF and CR line ends', () => {
    const text =
      '\uFEFFtime,price\r\n2026-01-01T00:00:00+01:00,10\n2026-01-01T01:00:00+01:00,"a\r\nb"\r2026-01-01T02:00:00+01:00,x\r\n';
    // Lines: 1 header (CRLF), 2 (LF), 3-4 quoted field with CRLF inside, 5 after a lone CR [D].
    expectIssues(text, [
      [3, /"a\nb" is not a number/],
      [5, /"x" is not a number/],
    ]);
  });

  it('skips blank lines without shifting the numbers of later lines', () => {
    const text = csv('time,price', '', '2026-01-01T00:00:00+01:00,10', '   ', '2026-01-01T01:00:00+01:00,bad');
    expectIssues(text, [[5, /"bad" is not a number/]]);
  });
});

describe('rejects bad options before reading the file (line 0)', () => {
  it('rejects a unit that does not fit the kind', () => {
    const result = parseProfileCsv(csv('time,load', '2026-01-01T00:00Z,1'), { ...PRICE, kind: 'load', unit: 'currency/MWh' });
    expect(result).toMatchObject({ ok: false, issues: [{ line: 0, message: expect.stringMatching(/kW, MW, kWh, MWh/) }] });
  });

  it('rejects an unknown time zone name', () => {
    const result = parseProfileCsv(csv('time,price', '2026-01-01T00:00Z,1'), { ...PRICE, timezone: 'Europe/Atlantis' });
    expect(result).toMatchObject({
      ok: false,
      issues: [{ line: 0, message: expect.stringMatching(/not a known IANA time zone/) }],
    });
  });
});

describe('explains common spreadsheet layouts it does not read', () => {
  it('rejects date and time split into two columns, saying to join them', () => {
    const text = csv('date,time,price', '2026-01-01,00:00,10', '2026-01-01,01:00,11');
    expectIssues(text, [
      [2, /"00:00" has a time of day but no date \(put date and time in one column\)/],
      [3, /"01:00" has a time of day but no date/],
    ]);
  });
});
