/**
 * The notes returned with an accepted profile: what was detected (delimiter,
 * columns, time style, resolution, period) and what was done (unit conversion,
 * interval-ending shift, gap filling), so the user can check every guess.
 */
import { describeDuration } from './check-sequence';
import { describeIndexRuns } from './fill-gaps';
import type { ColumnChoice } from './pick-columns';
import { canonicalFactor, canonicalUnitOf, isEnergyPerInterval, type AnyProfileKind, type ProfileUnit } from './profile-units';
import type { CsvTable } from './read-csv-rows';
import type { TimedRows } from './read-timed-rows';
import { formatInstant, formatOffset, type ZoneClock } from './zone-clock';
import type { DecimalSeparator } from './parse-decimal';
import type { DateOrder } from './parse-timestamp';

export interface ProfileFacts {
  readonly table: CsvTable;
  readonly columns: ColumnChoice;
  readonly timed: TimedRows;
  readonly clock: ZoneClock;
  readonly kind: AnyProfileKind;
  readonly unit: ProfileUnit;
  readonly intervalEnding: boolean;
  readonly dateOrder: DateOrder | undefined;
  readonly decimalSeparator: DecimalSeparator | undefined;
  readonly startMs: number;
  readonly stepMinutes: number;
  /** Values in the upload unit, gaps already filled. */
  readonly values: readonly number[];
  readonly filledIndexes: readonly number[];
}

const plural = (n: number, word: string): string => `${n} ${word}${n === 1 ? '' : 's'}`;

export function describeProfile(f: ProfileFacts): string[] {
  const zone = f.clock.timeZone;
  const notes: string[] = [];
  const semicolon = f.table.delimiter === ';';
  const numbers =
    f.decimalSeparator === ','
      ? ' with a decimal comma and points between thousands, as chosen'
      : f.decimalSeparator === '.'
        ? ' with a decimal point and commas between thousands, as chosen'
        : semicolon
          ? ' (a decimal comma is read as a decimal point)'
          : '';
  notes.push(`Read as ${semicolon ? 'semicolon' : 'comma'}-separated values${numbers}.`);
  if (f.dateOrder)
    notes.push(
      `Dates not in ISO 8601 were read ${f.dateOrder === 'dmy' ? 'day first (day-month-year, e.g. 08.12.2026 is 8 December)' : 'month first (month-day-year, e.g. 12/08/2026 is 8 December)'}, as chosen.`,
    );
  if (f.table.hadByteOrderMark) notes.push('A byte order mark at the start of the file was ignored.');
  notes.push(f.columns.note);
  if (f.columns.ignored.length > 0) notes.push(`Ignored columns: ${f.columns.ignored.map((c) => `"${c}"`).join(', ')}.`);

  if (f.timed.withOffset > 0) notes.push('Times carry UTC offsets and were read as the exact instants they state (RFC 3339).');
  if (f.timed.localTimes > 0) notes.push(`Times have no UTC offset and were read as local times in ${zone}.`);
  const foreign = f.timed.foreignOffset;
  if (foreign) {
    notes.push(
      `${plural(f.timed.foreignOffsetRows, 'row')} carry a UTC offset other than ${zone}'s (first on line ${foreign.line}: ${formatOffset(foreign.offset)} where ${zone} is at ${formatOffset(foreign.zoneOffset)}); they were read as the instants they state.`,
    );
  }

  const stepMs = f.stepMinutes * 60_000;
  const endMs = f.startMs + f.values.length * stepMs;
  notes.push(
    `${plural(f.values.length, 'interval')} of ${describeDuration(stepMs)} from ${formatInstant(f.startMs, f.clock)} to ${formatInstant(endMs, f.clock)}.`,
  );
  const timeHeader = f.table.header.fields[f.columns.timeColumn] ?? '';
  if (f.intervalEnding)
    notes.push(
      `Times mark the end of each interval; each was moved back by ${describeDuration(stepMs)} to the interval's start.`,
    );
  else {
    notes.push('Times mark the start of each interval.');
    if (/\bend(ing)?\b/i.test(timeHeader)) {
      notes.push(
        `The time column "${timeHeader}" is named like an interval end: if its times mark the end of each interval, upload again with interval-ending labels.`,
      );
    }
  }

  const factor = canonicalFactor(f.unit, f.stepMinutes);
  const canonical = canonicalUnitOf(f.kind);
  if (isEnergyPerInterval(f.unit)) {
    notes.push(`Converted ${f.unit} per ${f.stepMinutes}-minute interval to average ${canonical} (×${factor}).`);
  } else if (factor !== 1) notes.push(`Converted ${f.unit} to ${canonical} (×${factor}).`);

  if (f.filledIndexes.length > 0) {
    notes.push(
      `Filled ${plural(f.filledIndexes.length, 'missing interval')} by linear interpolation between neighbours (indexes ${describeIndexRuns(f.filledIndexes)}).`,
    );
  }
  const negatives = f.values.filter((v) => v < 0).length;
  if (negatives > 0) {
    notes.push(
      f.kind === 'price'
        ? `${plural(negatives, 'negative price')} kept: negative prices are valid.`
        : `${plural(negatives, 'negative value')} in a ${f.kind} profile; check the sign convention.`,
    );
  }
  return notes;
}
