/**
 * Well-formed uploads are read into the right instants, step and canonical
 * values, and the notes say what was detected. Expected instants are written
 * as RFC 3339 literals and read with Date.parse, independently of the parser.
 */
import { describe, expect, it } from 'vitest';
import { HOUR_MS, NEW_YORK, accepted, at, csv } from './support';

const localDate = (ms: number, timeZone: string): string =>
  // en-CA formats dates as YYYY-MM-DD; Intl is independent of the parser's offset code.
  new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(ms);

/** Rows for every interval from one UTC instant to another, labelled with a Berlin offset chosen by the EU rule. */
function berlinRows(fromUtc: string, toUtc: string, stepMinutes: number, value: (i: number) => string): string[] {
  // Summer time from 01:00 UTC on 2026-03-29 to 01:00 UTC on 2026-10-25 [S: Directive 2000/84/EC, Articles 2-3].
  const summerStart = at('2026-03-29T01:00:00Z');
  const summerEnd = at('2026-10-25T01:00:00Z');
  const rows: string[] = [];
  for (let ms = at(fromUtc), i = 0; ms < at(toUtc); ms += stepMinutes * 60_000, i += 1) {
    const offsetHours = ms >= summerStart && ms < summerEnd ? 2 : 1;
    const wall = new Date(ms + offsetHours * HOUR_MS).toISOString().slice(0, 19);
    rows.push(`${wall}+0${offsetHours}:00,${value(i)}`);
  }
  return rows;
}

describe('reads RFC 3339 times as exact instants', () => {
  it('reads offsets, lower-case t and a space separator alike', () => {
    // RFC 3339 section 5.6 (time-numoffset) and its note allowing "t" and a space for "T".
    const profile = accepted(
      csv('time,price', '2026-01-01T00:00:00+01:00,10', '2026-01-01t01:00:00+01:00,11', '2026-01-01 02:00:00+01:00,12'),
    );
    expect(profile.startMs).toBe(at('2025-12-31T23:00:00Z'));
    expect(profile.stepMinutes).toBe(60);
    expect(profile.values).toEqual([10, 11, 12]);
    expect(profile.notes.join(' ')).toMatch(/UTC offsets.*exact instants/);
  });

  it('reads Z and z as UTC', () => {
    // RFC 3339 section 5.6: time-offset = "Z" / time-numoffset; "z" is allowed too.
    const profile = accepted(csv('time,price', '2026-01-01T00:00:00Z,10', '2026-01-01T00:05:00.000z,11'));
    expect(profile.startMs).toBe(Date.UTC(2026, 0, 1));
    expect(profile.stepMinutes).toBe(5);
  });

  it('accepts consistent offsets that differ from the site zone, with a note', () => {
    const profile = accepted(csv('time,price', '2026-07-01T00:00Z,10', '2026-07-01T01:00Z,11'));
    expect(profile.startMs).toBe(at('2026-07-01T00:00:00Z'));
    expect(profile.notes.join(' ')).toMatch(
      /2 rows carry a UTC offset other than Europe\/Berlin's \(first on line 2: \+00:00 where Europe\/Berlin is at \+02:00\)/,
    );
  });

  it('keeps negative prices and says it kept them', () => {
    const profile = accepted(
      csv('time,price', '2026-05-10T12:00:00+02:00,-35.5', '2026-05-10T13:00:00+02:00,-0.01', '2026-05-10T14:00:00+02:00,4'),
    );
    expect(profile.values).toEqual([-35.5, -0.01, 4]);
    expect(profile.notes).toContain('2 negative prices kept: negative prices are valid.');
  });
});

describe('reads both DST days of Europe/Berlin as 23 and 25 hour days', () => {
  // Days have 23 or 25 hours (92 or 100 quarter-hours) [S: time series conventions, docs/sources.md].
  it('reads the spring day 2026-03-29 as 23 hourly intervals', () => {
    // Local midnight 2026-03-29 is 23:00Z the day before (UTC+1); the next midnight is 22:00Z (UTC+2) [D].
    const rows = berlinRows('2026-03-28T23:00:00Z', '2026-03-29T22:00:00Z', 60, (i) => String(i));
    expect(rows[2]).toBe('2026-03-29T03:00:00+02:00,2');
    const profile = accepted(csv('time,price', ...rows));
    expect(profile.values).toHaveLength(23);
    expect(profile.startMs).toBe(at('2026-03-29T00:00:00+01:00'));
    const days = new Set(profile.values.map((_, i) => localDate(profile.startMs + i * HOUR_MS, 'Europe/Berlin')));
    expect([...days]).toEqual(['2026-03-29']);
  });

  it('reads the autumn day 2026-10-25 as 25 hourly intervals, the repeated hour once per offset', () => {
    const rows = berlinRows('2026-10-24T22:00:00Z', '2026-10-25T23:00:00Z', 60, (i) => String(i));
    expect(rows.slice(2, 4)).toEqual(['2026-10-25T02:00:00+02:00,2', '2026-10-25T02:00:00+01:00,3']);
    const profile = accepted(csv('time,price', ...rows));
    expect(profile.values).toHaveLength(25);
    expect(profile.values[3]).toBe(3);
    const onDay = profile.values.filter((_, i) => localDate(profile.startMs + i * HOUR_MS, 'Europe/Berlin') === '2026-10-25');
    expect(onDay).toHaveLength(25);
  });

  it('reads the two DST days at 15 minutes as 92 and 100 quarter-hours', () => {
    const spring = accepted(csv('time,price', ...berlinRows('2026-03-28T23:00:00Z', '2026-03-29T22:00:00Z', 15, () => '1')));
    const autumn = accepted(csv('time,price', ...berlinRows('2026-10-24T22:00:00Z', '2026-10-25T23:00:00Z', 15, () => '1')));
    expect([spring.values.length, autumn.values.length]).toEqual([92, 100]);
  });

  it('reads local times without offsets across the spring day: 02:00-02:59 simply do not occur', () => {
    const hours = ['00', '01', '03', '04'];
    const profile = accepted(csv('time,price', ...hours.map((h) => `2026-03-29T${h}:00,${h}`)));
    expect(profile.startMs).toBe(at('2026-03-29T00:00:00+01:00'));
    expect(profile.values).toEqual([0, 1, 3, 4]);
    expect(profile.notes.join(' ')).toMatch(/local times in Europe\/Berlin/);
  });

  it('reads New York local times across its spring day (2026-03-08) the same way', () => {
    // [S: Energy Policy Act of 2005, section 110] clocks go from 02:00 EST to 03:00 EDT.
    const profile = accepted(csv('time,load', '2026-03-08T00:00,5', '2026-03-08T01:00,6', '2026-03-08T03:00,7'), {
      timezone: NEW_YORK,
      kind: 'load',
      unit: 'kW',
    });
    expect(profile.startMs).toBe(at('2026-03-08T00:00:00-05:00'));
    expect(profile.values).toEqual([5, 6, 7]);
  });
});

describe('reads European spreadsheet exports and interval-ending labels', () => {
  it('reads semicolons with decimal commas, a BOM and CRLF line ends', () => {
    const text =
      '\uFEFFZeitstempel start;Preis price\r\n2026-01-01T00:00;-1,5\r\n2026-01-01T00:15;2,25\r\n2026-01-01T00:30;3\r\n';
    const profile = accepted(text);
    expect(profile.values).toEqual([-1.5, 2.25, 3]);
    expect(profile.stepMinutes).toBe(15);
    expect(profile.notes.join(' ')).toMatch(/semicolon-separated.*byte order mark/);
  });

  it('shifts interval-ending labels back one step, reading 24:00 as the end of the day', () => {
    // Hour-ending labels 01:00..24:00 cover the day from 00:00 [S: FIX hour-ending labels; ISO 8601 24:00, docs/sources.md].
    const rows = Array.from({ length: 24 }, (_, h) => `2026-01-15T${String(h + 1).padStart(2, '0')}:00:00+01:00,${h}`);
    const profile = accepted(csv('interval end,price', ...rows), { intervalEnding: true });
    expect(profile.startMs).toBe(at('2026-01-15T00:00:00+01:00'));
    expect(profile.values).toHaveLength(24);
    expect(profile.values[23]).toBe(23);
    expect(profile.notes.join(' ')).toMatch(/end of each interval; each was moved back by 1 hour/);
  });

  it('warns when a column named like an interval end is read as interval-beginning', () => {
    const profile = accepted(csv('end,price', '2026-01-15T01:00Z,1', '2026-01-15T02:00Z,2'));
    expect(profile.startMs).toBe(at('2026-01-15T01:00:00Z'));
    expect(profile.notes.join(' ')).toMatch(/named like an interval end/);
  });
});

describe('converts units to the canonical kW and currency/MWh', () => {
  it('converts MW to kW', () => {
    const profile = accepted(csv('time,load', '2026-01-01T00:00Z,1.5', '2026-01-01T01:00Z,2.25'), { kind: 'load', unit: 'MW' });
    expect(profile.values).toEqual([1500, 2250]);
    expect(profile.unit).toBe('kW');
  });

  it('converts currency/kWh to currency/MWh', () => {
    // 1 MWh = 1000 kWh, so 0.085 per kWh is 85 per MWh [D].
    const profile = accepted(csv('time,price', '2026-01-01T00:00Z,0.085', '2026-01-01T01:00Z,-0.012'), { unit: 'currency/kWh' });
    expect(profile.values[0]).toBeCloseTo(85, 9);
    expect(profile.values[1]).toBeCloseTo(-12, 9);
    expect(profile.unit).toBe('currency/MWh');
  });

  it('converts kWh per 15-minute interval to average kW', () => {
    // 250 kWh delivered over 0.25 h is an average of 1000 kW [D].
    const profile = accepted(csv('time,generation', '2026-06-01T12:00Z,250', '2026-06-01T12:15Z,100'), {
      kind: 'generation',
      unit: 'kWh',
    });
    expect(profile.values).toEqual([1000, 400]);
    expect(profile.notes.join(' ')).toMatch(/kWh per 15-minute interval to average kW \(×4\)/);
  });

  it('converts MWh per 30-minute interval to average kW', () => {
    // 0.6 MWh over 0.5 h = 1.2 MW = 1200 kW [D].
    const profile = accepted(csv('time,load', '2026-06-01T12:00Z,0.6', '2026-06-01T12:30Z,0.5'), { kind: 'load', unit: 'MWh' });
    expect(profile.values[0]).toBeCloseTo(1200, 9);
    expect(profile.values[1]).toBeCloseTo(1000, 9);
  });
});

describe('fills gaps only when asked, by linear interpolation', () => {
  it('fills missing rows on the straight line between neighbours and lists them', () => {
    // 10 at t0 and 40 at t3: the line gives 20 at t1 and 30 at t2 [D].
    const profile = accepted(csv('time,price', '2026-01-01T00:00Z,10', '2026-01-01T03:00Z,40', '2026-01-01T04:00Z,41'), {
      fillGaps: true,
    });
    expect(profile.values).toEqual([10, 20, 30, 40, 41]);
    expect(profile.filledIndexes).toEqual([1, 2]);
    expect(profile.notes.join(' ')).toMatch(/Filled 2 missing intervals by linear interpolation.*indexes 1-2/);
  });

  it('fills blank values the same way', () => {
    const profile = accepted(csv('time,load', '2026-01-01T00:00Z,100', '2026-01-01T00:05Z,', '2026-01-01T00:10Z,200'), {
      fillGaps: true,
      kind: 'load',
      unit: 'kW',
    });
    expect(profile.values).toEqual([100, 150, 200]);
    expect(profile.filledIndexes).toEqual([1]);
  });
});

describe('chooses columns and explains the choice', () => {
  it("takes the kind's column among several value columns and ignores the rest", () => {
    const profile = accepted(
      csv('start,end,price,load', '2026-01-01T00:00Z,2026-01-01T01:00Z,10,500', '2026-01-01T01:00Z,2026-01-01T02:00Z,11,600'),
      { kind: 'load', unit: 'kW' },
    );
    expect(profile.values).toEqual([500, 600]);
    expect(profile.notes.join(' ')).toMatch(
      /Times from "start" \(column 1\).*values from "load" \(column 4\).*Ignored columns: "end", "price"/,
    );
  });

  it('takes the end column for interval-ending uploads', () => {
    const profile = accepted(
      csv('start,end,price', '2026-01-01T00:00Z,2026-01-01T01:00Z,10', '2026-01-01T01:00Z,2026-01-01T02:00Z,11'),
      { intervalEnding: true },
    );
    expect(profile.startMs).toBe(at('2026-01-01T00:00:00Z'));
    expect(profile.notes.join(' ')).toMatch(/Times from "end" \(column 2\)/);
  });

  it('falls back to the first two columns when the headers name neither', () => {
    const profile = accepted(csv('a,b', '2026-01-01T00:00Z,1', '2026-01-01T00:30Z,2'));
    expect(profile.values).toEqual([1, 2]);
    expect(profile.stepMinutes).toBe(30);
    expect(profile.notes.join(' ')).toMatch(
      /"a" \(column 1\), chosen because its first cell reads as a time; values from "b" \(column 2\), chosen as the first column after the times/,
    );
  });
});
