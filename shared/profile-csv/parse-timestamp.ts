/**
 * Reads one timestamp cell: ISO 8601 date and time, with a UTC offset (RFC 3339
 * section 5.6: `Z` or `±hh:mm`) or without one (then it is a local wall-clock
 * time in the site's zone, resolved elsewhere). Hand-written rather than
 * date-fns `parseISO` because it runs once per row on 100k-row files and must
 * say precisely what is wrong.
 *
 * Dates written day first or month first (`08.12.2026 00:00`, `12/08/2026 1:00 PM`)
 * are read only when the upload says which order the file uses (`dateOrder`):
 * 08.12.2026 is 8 December in one and 12 August in the other, so it is never guessed.
 */

/** How a file that does not write ISO 8601 dates orders day and month; absent: ISO 8601 only. */
export type DateOrder = 'dmy' | 'mdy';

export type TimestampReading =
  | {
      readonly ok: true;
      /** The wall-clock time written in the cell, as if it were UTC (epoch ms). */
      readonly wallMs: number;
      /** Minutes east of UTC when the cell carries an offset, else null (local time). */
      readonly offsetMinutes: number | null;
    }
  | { readonly ok: false; readonly reason: string };

// RFC 3339 allows `T`, `t` or a space between date and time, `Z` or `z` for UTC.
// `±hhmm` and `±hh` are ISO 8601 basic forms that spreadsheets also write.
const ISO_PATTERN =
  /^(\d{4})-(\d{2})-(\d{2})[Tt ](\d{2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)? ?(?:([Zz])|([+-])(\d{2})(?::?(\d{2}))?)?$/;
const DATE_ONLY = /^\d{4}-\d{2}-\d{2}$/;
// Day-first or month-first: one separator twice (. / -), a four-digit year, a time with optional
// seconds and AM/PM, optionally an offset as in the ISO pattern.
const ORDERED_PATTERN =
  /^(\d{1,2})([./-])(\d{1,2})\2(\d{4})(?:[Tt ]|, ?)(\d{1,2}):(\d{2})(?::(\d{2}))? ?([AaPp][Mm])?(?: ?(?:([Zz])|([+-])(\d{2})(?::?(\d{2}))?))?$/;
const SHORT_YEAR = /^\d{1,2}([./-])\d{1,2}\1\d{2}(?:[Tt ,]|$)/;
const TIME_ONLY = /^\d{1,2}:\d{2}(:\d{2})?$/;

const DAY_MS = 86_400_000;

const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function daysInMonth(year: number, month: number): number {
  // Gregorian leap years: divisible by 4, except centuries not divisible by 400.
  const leap = year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0);
  return month === 2 && leap ? 29 : (MONTH_DAYS[month - 1] ?? 0);
}

const fail = (reason: string): TimestampReading => ({ ok: false, reason });

/** The numbers of a cell that has the shape of an ISO 8601 time; ranges are checked afterwards. */
interface Parts {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
  millis: number;
  /** 0 when the cell has no offset, else the offset's sign (`Z` counts as +). */
  offsetSign: number;
  offsetHours: number;
  offsetMinutes: number;
}

/** Digit value at i, or -1: lets the fast path read fixed positions without allocating. */
function digit(cell: string, i: number): number {
  const d = cell.charCodeAt(i) - 48;
  return d >= 0 && d <= 9 ? d : -1;
}

function twoDigits(cell: string, i: number): number {
  const a = digit(cell, i);
  const b = digit(cell, i + 1);
  return a < 0 || b < 0 ? -1 : a * 10 + b;
}

/**
 * The common layouts (YYYY-MM-DDTHH:MM[:SS][Z|±HH:MM]) read by character
 * position: a year of 5-minute rows is 105 120 cells, and a regex match array
 * per cell costs more garbage collection than the rest of the row. Null means
 * "use the full pattern".
 */
function readFast(cell: string): Parts | null {
  if (cell.length < 16 || cell[4] !== '-' || cell[7] !== '-' || cell[13] !== ':') return null;
  const sep = cell[10];
  if (sep !== 'T' && sep !== 't' && sep !== ' ') return null;
  const hi = twoDigits(cell, 0);
  const lo = twoDigits(cell, 2);
  const month = twoDigits(cell, 5);
  const day = twoDigits(cell, 8);
  const hour = twoDigits(cell, 11);
  const minute = twoDigits(cell, 14);
  if (hi < 0 || lo < 0 || month < 0 || day < 0 || hour < 0 || minute < 0) return null;
  let at = 16;
  let second = 0;
  if (cell[at] === ':') {
    second = twoDigits(cell, 17);
    if (second < 0) return null;
    at = 19;
  }
  const parts: Parts = {
    year: hi * 100 + lo,
    month,
    day,
    hour,
    minute,
    second,
    millis: 0,
    offsetSign: 0,
    offsetHours: 0,
    offsetMinutes: 0,
  };
  if (at === cell.length) return parts;
  const c = cell[at];
  if ((c === 'Z' || c === 'z') && at + 1 === cell.length) {
    parts.offsetSign = 1;
    return parts;
  }
  if ((c === '+' || c === '-') && at + 6 === cell.length && cell[at + 3] === ':') {
    const oh = twoDigits(cell, at + 1);
    const om = twoDigits(cell, at + 4);
    if (oh < 0 || om < 0) return null;
    parts.offsetSign = c === '-' ? -1 : 1;
    parts.offsetHours = oh;
    parts.offsetMinutes = om;
    return parts;
  }
  return null;
}

function readPattern(cell: string): Parts | null {
  const m = ISO_PATTERN.exec(cell);
  if (m === null) return null;
  const num = (text: string | undefined): number => (text === undefined ? 0 : Number(text));
  return {
    year: num(m[1]),
    month: num(m[2]),
    day: num(m[3]),
    hour: num(m[4]),
    minute: num(m[5]),
    second: num(m[6]),
    millis: m[7] === undefined ? 0 : Math.round(Number(`0.${m[7]}`) * 1000),
    offsetSign: m[8] !== undefined ? 1 : m[9] === undefined ? 0 : m[9] === '-' ? -1 : 1,
    offsetHours: num(m[10]),
    offsetMinutes: num(m[11]),
  };
}

/** A day-first or month-first cell in the order given; the hour on a 12-hour clock when AM/PM follows. */
function readOrdered(cell: string, order: DateOrder): Parts | { reason: string } | null {
  const m = ORDERED_PATTERN.exec(cell);
  if (m === null) return null;
  const first = Number(m[1]);
  const second = Number(m[3]);
  let hour = Number(m[5]);
  const meridiem = m[8]?.toLowerCase();
  if (meridiem) {
    if (hour < 1 || hour > 12)
      return { reason: `"${cell}" has hour ${hour} with ${meridiem.toUpperCase()}; a 12-hour clock runs from 1 to 12` };
    hour = (hour % 12) + (meridiem === 'pm' ? 12 : 0);
  }
  return {
    year: Number(m[4]),
    month: order === 'dmy' ? second : first,
    day: order === 'dmy' ? first : second,
    hour,
    minute: Number(m[6]),
    second: m[7] === undefined ? 0 : Number(m[7]),
    millis: 0,
    offsetSign: m[9] !== undefined ? 1 : m[10] === undefined ? 0 : m[10] === '-' ? -1 : 1,
    offsetHours: m[11] === undefined ? 0 : Number(m[11]),
    offsetMinutes: m[12] === undefined ? 0 : Number(m[12]),
  };
}

/** True for a cell such as 08.12.2026 00:00: a date and time written day or month first. */
export function looksDayOrMonthFirst(cell: string): boolean {
  return ORDERED_PATTERN.test(cell);
}

const pad = (n: number, width = 2): string => String(n).padStart(width, '0');

const ORDER_WORDS: Readonly<Record<DateOrder, string>> = { dmy: 'day-month-year', mdy: 'month-day-year' };

/** Why a cell that is not ISO 8601 was refused, and what to choose or write instead. */
function notReadable(cell: string, order: DateOrder | undefined): TimestampReading {
  if (cell === '') return fail('the time is empty');
  if (DATE_ONLY.test(cell)) return fail(`"${cell}" has a date but no time of day`);
  // Spreadsheet exports often split date and time into two columns.
  if (TIME_ONLY.test(cell)) return fail(`"${cell}" has a time of day but no date (put date and time in one column)`);
  if (SHORT_YEAR.test(cell)) return fail(`"${truncate(cell)}" has a two-digit year; write the year with four digits`);
  if (order === undefined && ORDERED_PATTERN.test(cell)) {
    return fail(
      `"${truncate(cell)}" is not an ISO 8601 date and time; it writes the day and month first, which can be read two ways: choose the file's date order at upload (day-month-year or month-day-year)`,
    );
  }
  const also = order
    ? ` or a ${ORDER_WORDS[order]} date and time such as ${order === 'dmy' ? '08.12.2026 00:00' : '12/08/2026 00:00'}`
    : '';
  return fail(`"${truncate(cell)}" is not an ISO 8601 date and time${also}`);
}

export function parseTimestamp(cell: string, order?: DateOrder): TimestampReading {
  let p = readFast(cell) ?? readPattern(cell);
  let readAs = '';
  if (p === null && order !== undefined) {
    const ordered = readOrdered(cell, order);
    if (ordered !== null && 'reason' in ordered) return fail(ordered.reason);
    p = ordered;
    readAs = ` (read as ${ORDER_WORDS[order]})`;
  }
  if (p === null) return notReadable(cell, order);
  const { year, month, day, hour, minute, second, millis } = p;
  // Also keeps Date.UTC away from its 0-99 → 1900-1999 year mapping.
  if (year < 1900 || year > 2199) return fail(`"${cell}" has the year ${pad(year, 4)}, outside 1900-2199`);
  if (month < 1 || month > 12) return fail(`"${cell}" has month ${pad(month)}${readAs}, which does not exist`);
  if (day < 1 || day > daysInMonth(year, month)) {
    return fail(`"${cell}" has day ${pad(day)}${readAs}, which does not exist in ${pad(year, 4)}-${pad(month)}`);
  }
  // ISO 8601 lets 24:00 mean the end of the day, common in interval-ending labels.
  const endOfDay = hour === 24 && minute === 0 && second === 0 && millis === 0;
  if (hour > 23 && !endOfDay)
    return fail(`"${cell}" has hour ${pad(hour)}; hours run from 00 to 23 (or 24:00 for the end of a day)`);
  if (minute > 59) return fail(`"${cell}" has minute ${pad(minute)}; minutes run from 00 to 59`);
  if (second > 59) return fail(`"${cell}" has second ${pad(second)}; seconds run from 00 to 59`);

  let offsetMinutes: number | null = null;
  if (p.offsetSign !== 0) {
    if (p.offsetHours > 23 || p.offsetMinutes > 59) {
      const shown = `${p.offsetSign < 0 ? '-' : '+'}${pad(p.offsetHours)}:${pad(p.offsetMinutes)}`;
      return fail(`"${cell}" has the UTC offset ${shown}, which is out of range`);
    }
    // RFC 3339 section 4.3: -00:00 names the UTC instant with an unknown local offset.
    offsetMinutes = p.offsetSign * (p.offsetHours * 60 + p.offsetMinutes) || 0;
  }

  const wallMs = Date.UTC(year, month - 1, day, endOfDay ? 0 : hour, minute, second) + millis + (endOfDay ? DAY_MS : 0);
  return { ok: true, wallMs, offsetMinutes };
}

export function truncate(text: string, max = 40): string {
  return text.length <= max ? text : `${text.slice(0, max)}…`;
}
