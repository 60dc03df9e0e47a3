/**
 * Turns CSV rows into (instant, value) rows: reads each time as an instant
 * (with its offset, or as a local time in the site's zone that must name
 * exactly one instant), checks that explicit offsets change only where the
 * site's zone changes its own, and reads each value.
 */
import type { TimedRow } from './check-sequence';
import type { IssueList } from './issue-list';
import { parseNumber } from './parse-number';
import { parseTimestamp } from './parse-timestamp';
import type { CsvRow } from './read-csv-rows';
import { formatOffset, type ZoneClock } from './zone-clock';

export interface TimedRowsContext {
  readonly timeColumn: number;
  readonly valueColumn: number;
  readonly columnCount: number;
  readonly valueHeader: string;
  readonly decimalComma: boolean;
  readonly fillGaps: boolean;
  readonly clock: ZoneClock;
}

export interface TimedRows {
  readonly rows: TimedRow[];
  /** Rows written with an explicit UTC offset / as local wall-clock times. */
  readonly withOffset: number;
  readonly localTimes: number;
  /** First row whose explicit offset differs from the site zone's offset at that instant. */
  readonly foreignOffset: { line: number; offset: number; zoneOffset: number } | null;
  readonly foreignOffsetRows: number;
  readonly blankLines: number[];
}

const HOUR_MS = 3_600_000;
const utc = (minutes: number): string => `UTC${formatOffset(minutes)}`;

export function readTimedRows(csvRows: readonly CsvRow[], ctx: TimedRowsContext, issues: IssueList): TimedRows {
  const { clock } = ctx;
  const zone = clock.timeZone;
  const rows: TimedRow[] = [];
  let withOffset = 0;
  let localTimes = 0;
  let firstStyle: { line: number; offset: boolean } | null = null;
  let prevOffsetRow: { line: number; ms: number; offset: number } | null = null;
  let foreignOffset: TimedRows['foreignOffset'] = null;
  let foreignOffsetRows = 0;
  const blankLines: number[] = [];

  for (const { line, fields } of csvRows) {
    const timeText = fields[ctx.timeColumn] ?? '';
    if (fields.length <= Math.max(ctx.timeColumn, ctx.valueColumn)) {
      issues.add(
        'structure',
        line,
        `Line ${line} has ${fields.length} field${fields.length === 1 ? '' : 's'} but the header has ${ctx.columnCount}. Give every row a time and a value, separated like the header.`,
      );
      rows.push({ line, ms: Number.NaN, value: Number.NaN, timeText });
      continue;
    }

    let ms = Number.NaN;
    const time = parseTimestamp(timeText);
    if (!time.ok) {
      issues.add(
        'time',
        line,
        `Line ${line}: ${time.reason}. Write the time like 2026-01-01T00:00:00+01:00, or 2026-01-01T00:00 for local time in ${zone}.`,
      );
    } else {
      const hasOffset = time.offsetMinutes !== null;
      if (firstStyle === null) firstStyle = { line, offset: hasOffset };
      else if (firstStyle.offset !== hasOffset) {
        issues.add(
          'offset',
          line,
          `Line ${line}: ${timeText} has ${hasOffset ? 'a UTC offset' : 'no UTC offset'} but line ${firstStyle.line} ${firstStyle.offset ? 'has one' : 'has none'}. Write every time with its offset, or every time without one (local time in ${zone}).`,
        );
      }
      if (time.offsetMinutes !== null) {
        withOffset += 1;
        ms = time.wallMs - time.offsetMinutes * 60_000;
        const zoneOffset = clock.offsetAt(ms);
        if (zoneOffset !== time.offsetMinutes) {
          foreignOffsetRows += 1;
          foreignOffset ??= { line, offset: time.offsetMinutes, zoneOffset };
        }
        if (prevOffsetRow && prevOffsetRow.offset !== time.offsetMinutes) {
          // A change is explained only when the site's zone changes by the same amount in between.
          const zoneBefore = clock.offsetAt(prevOffsetRow.ms);
          if (time.offsetMinutes - prevOffsetRow.offset !== zoneOffset - zoneBefore) {
            const zoneSays =
              zoneBefore === zoneOffset ? `stays at ${utc(zoneOffset)}` : `goes from ${utc(zoneBefore)} to ${utc(zoneOffset)}`;
            issues.add(
              'offset',
              line,
              `Line ${line}: the UTC offset jumps from ${formatOffset(prevOffsetRow.offset)} (line ${prevOffsetRow.line}) to ${formatOffset(time.offsetMinutes)}, but ${zone} ${zoneSays} between these times. Check the times around this line; use one offset throughout or the offsets of ${zone}.`,
            );
          }
        }
        prevOffsetRow = { line, ms, offset: time.offsetMinutes };
      } else {
        localTimes += 1;
        const instants = clock.instantsOf(time.wallMs);
        const before = clock.offsetAt(time.wallMs - 15 * HOUR_MS);
        const after = clock.offsetAt(time.wallMs + 15 * HOUR_MS);
        if (instants.length === 1) ms = instants[0] as number;
        else if (instants.length === 0) {
          issues.add(
            'local-time',
            line,
            `Line ${line}: ${timeText} does not exist in ${zone}: the clocks jump forward that night (${utc(before)} to ${utc(after)}). Remove the row, or write every time with its UTC offset.`,
          );
        } else {
          issues.add(
            'local-time',
            line,
            `Line ${line}: ${timeText} happens twice in ${zone} (the clocks go back from ${utc(before)} to ${utc(after)} that night), so it is ambiguous. Write every time with its UTC offset, e.g. ${timeText}${formatOffset(before)} for the first and ${timeText}${formatOffset(after)} for the second.`,
          );
        }
      }
    }

    const reading = parseNumber(fields[ctx.valueColumn] ?? '', ctx.decimalComma);
    let value = Number.NaN;
    if (reading.ok) value = reading.value;
    else if (reading.blank && ctx.fillGaps) blankLines.push(line);
    else if (reading.blank) {
      issues.add(
        'number',
        line,
        `Line ${line}: the value in "${ctx.valueHeader}" is empty. Enter a number, or upload with gap filling turned on to interpolate it.`,
      );
    } else {
      issues.add(
        'number',
        line,
        `Line ${line}: ${reading.reason} in "${ctx.valueHeader}". Write a plain number such as -12.5${ctx.decimalComma ? ' or -12,5' : ''}.`,
      );
    }
    rows.push({ line, ms, value, timeText });
  }
  return { rows, withOffset, localTimes, foreignOffset, foreignOffsetRows, blankLines };
}
