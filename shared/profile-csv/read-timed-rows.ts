/**
 * Turns CSV rows into (instant, value) rows: reads each time as an instant
 * (with its offset, or as a local time in the site's zone that must name
 * exactly one instant), checks that explicit offsets change only where the
 * site's zone changes its own, and reads each value.
 */
import type { TimedRow } from './check-sequence';
import type { IssueList } from './issue-list';
import { parseNumber } from './parse-number';
import { parseTimestamp, type DateOrder } from './parse-timestamp';
import type { DecimalSeparator } from './parse-decimal';
import type { CsvRow } from './read-csv-rows';
import { formatOffset, type ZoneClock } from './zone-clock';

export interface TimedRowsContext {
  readonly timeColumn: number;
  readonly valueColumn: number;
  readonly columnCount: number;
  readonly valueHeader: string;
  readonly decimalComma: boolean;
  /** Declared at upload: the decimal separator (the other one then separates thousands). */
  readonly decimalSeparator: DecimalSeparator | undefined;
  /** Declared at upload: day-first or month-first dates; absent, ISO 8601 only. */
  readonly dateOrder: DateOrder | undefined;
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
}

const HOUR_MS = 3_600_000;
const utc = (minutes: number): string => `UTC${formatOffset(minutes)}`;

/** Follows the explicit offsets through the file and flags changes the site's zone does not make. */
class OffsetTracker {
  private previous: { line: number; ms: number; offset: number } | null = null;
  foreign: TimedRows['foreignOffset'] = null;
  foreignRows = 0;

  constructor(
    private readonly clock: ZoneClock,
    private readonly issues: IssueList,
  ) {}

  instant(line: number, wallMs: number, offset: number): number {
    const ms = wallMs - offset * 60_000;
    const zoneOffset = this.clock.offsetAt(ms);
    if (zoneOffset !== offset) {
      this.foreignRows += 1;
      this.foreign ??= { line, offset, zoneOffset };
    }
    const prev = this.previous;
    if (prev && prev.offset !== offset) {
      // A change is explained only when the site's zone changes by the same amount in between.
      const zoneBefore = this.clock.offsetAt(prev.ms);
      if (offset - prev.offset !== zoneOffset - zoneBefore) {
        const zone = this.clock.timeZone;
        const zoneSays =
          zoneBefore === zoneOffset ? `stays at ${utc(zoneOffset)}` : `goes from ${utc(zoneBefore)} to ${utc(zoneOffset)}`;
        this.issues.add(
          'offset',
          line,
          `Line ${line}: the UTC offset jumps from ${formatOffset(prev.offset)} (line ${prev.line}) to ${formatOffset(offset)}, but ${zone} ${zoneSays} between these times. Check the times around this line; use one offset throughout or the offsets of ${zone}.`,
        );
      }
    }
    this.previous = { line, ms, offset };
    return ms;
  }
}

/** The one instant a local wall time names in the site's zone, or NaN after reporting why there is none. */
function localInstant(line: number, timeText: string, wallMs: number, clock: ZoneClock, issues: IssueList): number {
  const instants = clock.instantsOf(wallMs);
  if (instants.length === 1) return instants[0] as number;
  const zone = clock.timeZone;
  const before = clock.offsetAt(wallMs - 15 * HOUR_MS);
  const after = clock.offsetAt(wallMs + 15 * HOUR_MS);
  issues.add(
    'local-time',
    line,
    instants.length === 0
      ? `Line ${line}: ${timeText} does not exist in ${zone}: the clocks jump forward that night (${utc(before)} to ${utc(after)}). Remove the row, or write every time with its UTC offset.`
      : `Line ${line}: ${timeText} happens twice in ${zone} (the clocks go back from ${utc(before)} to ${utc(after)} that night), so it is ambiguous. Write every time with its UTC offset, e.g. ${timeText}${formatOffset(before)} for the first and ${timeText}${formatOffset(after)} for the second.`,
  );
  return Number.NaN;
}

/** How to write a value in this file. */
function numberExample(ctx: TimedRowsContext): string {
  if (ctx.decimalSeparator === ',') return 'Write a number such as -1.012,5 or -1012,5 (decimal comma, as chosen).';
  if (ctx.decimalSeparator === '.') return 'Write a number such as -1,012.5 or -1012.5 (decimal point, as chosen).';
  return `Write a plain number such as -12.5${ctx.decimalComma ? ' or -12,5' : ''}.`;
}

/** The value in the upload unit; NaN when blank (to be filled) or unreadable (reported). */
function readValue(line: number, cell: string, ctx: TimedRowsContext, issues: IssueList): number {
  const reading = parseNumber(cell, ctx.decimalComma, ctx.decimalSeparator);
  if (reading.ok) return reading.value;
  if (reading.blank && !ctx.fillGaps) {
    issues.add(
      'number',
      line,
      `Line ${line}: the value in "${ctx.valueHeader}" is empty. Enter a number, or upload with gap filling turned on to interpolate it.`,
    );
  } else if (!reading.blank) {
    issues.add('number', line, `Line ${line}: ${reading.reason} in "${ctx.valueHeader}". ${numberExample(ctx)}`);
  }
  return Number.NaN;
}

export function readTimedRows(csvRows: readonly CsvRow[], ctx: TimedRowsContext, issues: IssueList): TimedRows {
  const { clock } = ctx;
  const zone = clock.timeZone;
  const offsets = new OffsetTracker(clock, issues);
  const rows: TimedRow[] = [];
  let withOffset = 0;
  let localTimes = 0;
  let firstStyle: { line: number; offset: boolean } | null = null;

  for (const { line, fields } of csvRows) {
    const timeText = fields[ctx.timeColumn] ?? '';
    if (fields.length <= Math.max(ctx.timeColumn, ctx.valueColumn)) {
      const n = fields.length;
      issues.add(
        'structure',
        line,
        `Line ${line} has ${n} field${n === 1 ? '' : 's'} but the header has ${ctx.columnCount}. Give every row a time and a value, separated like the header.`,
      );
      rows.push({ line, ms: Number.NaN, value: Number.NaN, timeText });
      continue;
    }

    // More fields than the header: most often a decimal comma in a comma-separated file, which splits
    // the value in two; reading the first half would store a wrong number.
    if (fields.length > ctx.columnCount && fields.slice(ctx.columnCount).some((f) => f !== '')) {
      issues.add(
        'structure',
        line,
        `Line ${line} has ${fields.length} fields but the header has ${ctx.columnCount}. If a value has a decimal comma, put it in quotes ("12,5") or separate the columns with semicolons.`,
      );
      rows.push({ line, ms: Number.NaN, value: Number.NaN, timeText });
      continue;
    }

    let ms = Number.NaN;
    const time = parseTimestamp(timeText, ctx.dateOrder);
    if (!time.ok) {
      issues.add(
        'time',
        line,
        `Line ${line}: ${time.reason}. Write the time like 2026-01-01T00:00:00+01:00, or 2026-01-01T00:00 for local time in ${zone}${ctx.dateOrder ? `, or ${ctx.dateOrder === 'dmy' ? '01.01.2026 00:00' : '01/01/2026 00:00'}` : ''}.`,
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
        ms = offsets.instant(line, time.wallMs, time.offsetMinutes);
      } else {
        localTimes += 1;
        ms = localInstant(line, timeText, time.wallMs, clock, issues);
      }
    }
    rows.push({ line, ms, value: readValue(line, fields[ctx.valueColumn] ?? '', ctx, issues), timeText });
  }
  return { rows, withOffset, localTimes, foreignOffset: offsets.foreign, foreignOffsetRows: offsets.foreignRows };
}
