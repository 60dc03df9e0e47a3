/**
 * Reads one timestamp cell: ISO 8601 date and time, with a UTC offset (RFC 3339
 * section 5.6: `Z` or `±hh:mm`) or without one (then it is a local wall-clock
 * time in the site's zone, resolved elsewhere). Hand-written rather than
 * date-fns `parseISO` because it runs once per row on 100k-row files and must
 * say precisely what is wrong.
 */

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
const TIME_ONLY = /^\d{1,2}:\d{2}(:\d{2})?$/;

const DAY_MS = 86_400_000;

const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function daysInMonth(year: number, month: number): number {
  // Gregorian leap years: divisible by 4, except centuries not divisible by 400.
  const leap = year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0);
  return month === 2 && leap ? 29 : (MONTH_DAYS[month - 1] ?? 0);
}

const fail = (reason: string): TimestampReading => ({ ok: false, reason });

export function parseTimestamp(cell: string): TimestampReading {
  const m = ISO_PATTERN.exec(cell);
  if (m === null) {
    if (cell === '') return fail('the time is empty');
    if (DATE_ONLY.test(cell)) return fail(`"${cell}" has a date but no time of day`);
    // Spreadsheet exports often split date and time into two columns.
    if (TIME_ONLY.test(cell)) return fail(`"${cell}" has a time of day but no date (put date and time in one column)`);
    return fail(`"${truncate(cell)}" is not an ISO 8601 date and time`);
  }
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  const hour = Number(m[4]);
  const minute = Number(m[5]);
  const second = m[6] === undefined ? 0 : Number(m[6]);
  const fraction = m[7] === undefined ? 0 : Number(`0.${m[7]}`);

  // Also keeps Date.UTC away from its 0-99 → 1900-1999 year mapping.
  if (year < 1900 || year > 2199) return fail(`"${cell}" has the year ${m[1]}, outside 1900-2199`);
  if (month < 1 || month > 12) return fail(`"${cell}" has month ${m[2]}, which does not exist`);
  if (day < 1 || day > daysInMonth(year, month)) {
    return fail(`"${cell}" has day ${m[3]}, which does not exist in ${m[1]}-${m[2]}`);
  }
  // ISO 8601 lets 24:00 mean the end of the day, common in interval-ending labels.
  const endOfDay = hour === 24 && minute === 0 && second === 0 && fraction === 0;
  if (hour > 23 && !endOfDay) return fail(`"${cell}" has hour ${m[4]}; hours run from 00 to 23 (or 24:00 for the end of a day)`);
  if (minute > 59) return fail(`"${cell}" has minute ${m[5]}; minutes run from 00 to 59`);
  if (second > 59) return fail(`"${cell}" has second ${m[6] ?? ''}; seconds run from 00 to 59`);

  let offsetMinutes: number | null = null;
  if (m[8] !== undefined) offsetMinutes = 0;
  else if (m[9] !== undefined) {
    const oh = Number(m[10]);
    const om = m[11] === undefined ? 0 : Number(m[11]);
    if (oh > 23 || om > 59) return fail(`"${cell}" has the UTC offset ${m[9]}${m[10]}:${m[11] ?? '00'}, which is out of range`);
    // RFC 3339 section 4.3: -00:00 names the UTC instant with an unknown local offset.
    offsetMinutes = (m[9] === '-' ? -1 : 1) * (oh * 60 + om);
  }

  const wallMs =
    Date.UTC(year, month - 1, day, endOfDay ? 0 : hour, minute, second) + Math.round(fraction * 1000) + (endOfDay ? DAY_MS : 0);
  return { ok: true, wallMs, offsetMinutes };
}

export function truncate(text: string, max = 40): string {
  return text.length <= max ? text : `${text.slice(0, max)}…`;
}
