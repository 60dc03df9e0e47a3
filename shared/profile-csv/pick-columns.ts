/**
 * Chooses the timestamp column and the value column from the header names
 * (time/timestamp/start/datetime…, value/price/load…), falling back to the
 * column whose first cell reads as a time and the next column after it.
 * The choice is explained in a note so the user can check it.
 */
import type { AnyProfileKind } from './profile-units';
import { looksDayOrMonthFirst, parseTimestamp, type DateOrder } from './parse-timestamp';

export interface ColumnChoice {
  readonly timeColumn: number;
  readonly valueColumn: number;
  readonly note: string;
  readonly ignored: readonly string[];
}

// "utc" adds nothing: where a file has a local-time column and a UTC one (as Slackwater's own
// export: interval_start, interval_start_utc), both name the same instants and the first wins.
const TIME_WORDS: Readonly<Record<string, number>> = {
  timestamp: 3,
  datetime: 3,
  time: 2,
  ts: 2,
  date: 1,
  interval: 1,
  period: 1,
};
const START_WORDS = ['start', 'begin', 'beginning', 'from'];
const END_WORDS = ['end', 'ending', 'to'];

const KIND_WORDS: Readonly<Record<AnyProfileKind, readonly string[]>> = {
  price: ['price', 'prices', 'tariff', 'cost', 'rate'],
  load: ['load', 'demand', 'consumption'],
  generation: ['generation', 'gen', 'pv', 'solar', 'production', 'output', 'wind'],
  availability: ['availability', 'available', 'derating', 'fraction', 'share'],
  'reserve-up-price': ['price', 'prices', 'reserve', 'up', 'upward', 'capacity'],
  'reserve-down-price': ['price', 'prices', 'reserve', 'down', 'downward', 'capacity'],
};
const VALUE_WORDS = ['value', 'values', 'power', 'energy', 'kw', 'mw', 'kwh', 'mwh', 'currency', 'eur', 'usd', 'gbp'];

function words(header: string): string[] {
  return header
    .toLowerCase()
    .split(/[^a-z0-9]+/)
    .filter((w) => w !== '');
}

function timeScore(header: string, intervalEnding: boolean): number {
  let score = 0;
  for (const word of words(header)) {
    score += TIME_WORDS[word] ?? 0;
    if (START_WORDS.includes(word)) score += intervalEnding ? 1 : 4;
    if (END_WORDS.includes(word)) score += intervalEnding ? 4 : 1;
  }
  return score;
}

function valueScore(header: string, kind: AnyProfileKind): number {
  let score = 0;
  for (const word of words(header)) {
    if (KIND_WORDS[kind].includes(word)) score += 3;
    else if (VALUE_WORDS.includes(word)) score += word === 'value' || word === 'values' ? 2 : 1;
  }
  return score;
}

function best(scores: readonly number[]): number {
  let at = -1;
  scores.forEach((s, i) => {
    if (s > 0 && (at < 0 || s > (scores[at] ?? 0))) at = i;
  });
  return at;
}

function describe(header: readonly string[], column: number): string {
  return `"${header[column] ?? ''}" (column ${column + 1})`;
}

/** Returns the choice, or a reason (for the header line) when no timestamp column can be found. */
export function pickColumns(
  header: readonly string[],
  firstRow: readonly string[] | undefined,
  kind: AnyProfileKind,
  intervalEnding: boolean,
  dateOrder?: DateOrder,
): ColumnChoice | { reason: string } {
  let timeColumn = best(header.map((h) => timeScore(h, intervalEnding)));
  let how = 'by its header name';
  if (timeColumn < 0) {
    timeColumn = (firstRow ?? []).findIndex((cell) => parseTimestamp(cell, dateOrder).ok);
    how = 'because its first cell reads as a time';
  }
  const ordered = (firstRow ?? []).findIndex(looksDayOrMonthFirst);
  if (timeColumn < 0 && dateOrder === undefined && ordered >= 0) {
    return {
      reason: `no timestamp column in ISO 8601: column ${ordered + 1} ("${header[ordered] ?? ''}") holds "${firstRow?.[ordered] ?? ''}", a date written day or month first, which can be read two ways. Choose the file's date order at upload (day-month-year or month-day-year).`,
    };
  }
  if (timeColumn < 0) {
    return {
      reason: `no timestamp column: no header (${header.map((h) => `"${h}"`).join(', ')}) names a time (time, timestamp, datetime, start) and no column holds an ISO 8601 time on the first data row. Add a column of times such as 2026-01-01T00:00:00+01:00 and name it "time".`,
    };
  }

  const scores = header.map((h, i) => (i === timeColumn ? 0 : valueScore(h, kind)));
  let valueColumn = best(scores);
  let valueHow = 'by its header name';
  if (valueColumn < 0) {
    // No recognisable name: the column after the times, else the first other column.
    valueColumn = timeColumn + 1 < header.length ? timeColumn + 1 : header.findIndex((_, i) => i !== timeColumn);
    valueHow = 'as the first column after the times';
  }
  const ignored = header.filter((_, i) => i !== timeColumn && i !== valueColumn);
  return {
    timeColumn,
    valueColumn,
    ignored,
    note: `Times from ${describe(header, timeColumn)}, chosen ${how}; values from ${describe(header, valueColumn)}, chosen ${valueHow}.`,
  };
}
