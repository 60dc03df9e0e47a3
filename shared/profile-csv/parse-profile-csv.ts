/**
 * Parses an uploaded profile CSV into a regular series in the
 * canonical unit of its kind, or into every problem found, each with the
 * physical line of the file and how to fix it. Pure and browser-safe: the
 * browser preview and the server (the authority) run the same code.
 */
import { checkSequence } from './check-sequence';
import { fillGapsLinearly } from './fill-gaps';
import { DEFAULT_MAX_ISSUES, IssueList, type ProfileIssue } from './issue-list';
import type { DecimalSeparator } from './parse-decimal';
import { parseTimestamp, type DateOrder } from './parse-timestamp';
import { pickColumns } from './pick-columns';
import { describeProfile } from './profile-notes';
import { ALL_PROFILE_KINDS, canonicalFactor, canonicalUnitOf, type AnyProfileKind, type ProfileUnit } from './profile-units';
import { checkValueRange } from './check-range';
import { resolveProfileUnit } from './price-units';
import { readCsvRows } from './read-csv-rows';
import { readTimedRows } from './read-timed-rows';
import { createZoneClock, type ZoneClock } from './zone-clock';

export type { ProfileIssue } from './issue-list';

export interface ParseProfileOptions {
  kind: AnyProfileKind;
  /** One of unitsFor(kind), or for prices the site's currency per MWh or kWh (e.g. EUR/MWh, see price-units.ts). */
  unit: string;
  /** The site's currency (ISO 4217, e.g. EUR): lets a price upload name it; any other currency is refused. */
  currency?: string;
  /** IANA name of the site's time zone; local times without offsets are read in it. */
  timezone: string;
  /** Labels mark the end of each interval (shifted back one step). Default false: interval-beginning. */
  intervalEnding?: boolean;
  /** Fill missing intervals and blank values by linear interpolation. Default false: reject gaps. */
  fillGaps?: boolean;
  /** Dates written day first (`dmy`, 08.12.2026 00:00) or month first (`mdy`, 12/08/2026 00:00); default: ISO 8601 only. */
  dateOrder?: DateOrder;
  /**
   * The decimal separator of the values; the other of point and comma then separates thousands
   * (1.010,25 or 1,010.25). Default: a point, or a comma in semicolon-separated files, no thousands separators.
   */
  decimalSeparator?: DecimalSeparator;
  /** Most problems reported. Default 50. */
  maxIssues?: number;
}

export interface ParsedProfile {
  /** Start of the first interval, UTC epoch ms. */
  startMs: number;
  stepMinutes: number;
  /** One value per interval, in `unit`. */
  values: number[];
  /** Canonical unit: currency/MWh for prices, kW for load and generation. */
  unit: string;
  /** Indexes into values that were interpolated (fillGaps only). */
  filledIndexes: number[];
  /** What was detected and done, for the user to check. */
  notes: string[];
}

export type ParseProfileResult = { ok: true; profile: ParsedProfile } | { ok: false; issues: ProfileIssue[]; hint: string };

interface CheckedOptions {
  clock: ZoneClock;
  unit: ProfileUnit;
  /** The currency a price unit named (the site's), else null. */
  currency: string | null;
}

function checkOptions(options: ParseProfileOptions, issues: IssueList): CheckedOptions | null {
  let unit: ProfileUnit | null = null;
  let currency: string | null = null;
  if (!(ALL_PROFILE_KINDS as readonly string[]).includes(options.kind)) {
    issues.add('options', 0, `The kind "${String(options.kind)}" is not known; choose ${ALL_PROFILE_KINDS.join(', ')}.`);
  } else {
    const resolved = resolveProfileUnit(options.kind, options.unit, options.currency);
    if (resolved.ok) [unit, currency] = [resolved.unit, resolved.currency];
    else issues.add('options', 0, resolved.message);
  }
  const clock = createZoneClock(options.timezone);
  if (clock === null)
    issues.add(
      'options',
      0,
      `The site's time zone "${options.timezone}" is not a known IANA time zone name (such as Europe/Berlin); correct the site first.`,
    );
  if (options.dateOrder !== undefined && !['dmy', 'mdy'].includes(options.dateOrder))
    issues.add(
      'options',
      0,
      `The date order "${String(options.dateOrder)}" is not known; choose dmy or mdy, or none for ISO 8601.`,
    );
  if (options.decimalSeparator !== undefined && !['.', ','].includes(options.decimalSeparator))
    issues.add(
      'options',
      0,
      `The decimal separator "${String(options.decimalSeparator)}" is not known; choose "." or ",", or none for plain numbers.`,
    );
  return issues.count === 0 && clock !== null && unit !== null ? { clock, unit, currency } : null;
}

function failure(issues: IssueList): ParseProfileResult {
  return { ok: false, issues: issues.issues(), hint: issues.hint() };
}

export function parseProfileCsv(text: string, options: ParseProfileOptions): ParseProfileResult {
  const maxIssues =
    options.maxIssues !== undefined && options.maxIssues >= 1 ? Math.floor(options.maxIssues) : DEFAULT_MAX_ISSUES;
  const issues = new IssueList(maxIssues);
  const intervalEnding = options.intervalEnding ?? false;
  const fillGaps = options.fillGaps ?? false;

  const checked = checkOptions(options, issues);
  if (checked === null) return failure(issues);
  const { clock, unit, currency } = checked;
  const table = readCsvRows(text, issues);
  if (table === null) return failure(issues);

  const { header } = table;
  const headerCells = header.fields;
  if (headerCells.some((cell) => parseTimestamp(cell, options.dateOrder).ok)) {
    issues.add(
      'structure',
      header.line,
      `Line ${header.line} holds data, not column names: the file needs a header row. Add a first line such as time${table.delimiter}value.`,
    );
    return failure(issues);
  }
  if (headerCells.length < 2) {
    issues.add(
      'structure',
      header.line,
      `Line ${header.line} has a single column "${headerCells[0] ?? ''}"; a profile needs a time column and a value column separated by a comma or a semicolon${headerCells[0]?.includes('\t') ? ' (tabs are not accepted)' : ''}.`,
    );
    return failure(issues);
  }
  if (table.rows.length === 0) {
    issues.add(
      'structure',
      header.line,
      `The file has a header row (line ${header.line}) but no data rows. Add one row per interval below the header.`,
    );
    return failure(issues);
  }

  const columns = pickColumns(headerCells, table.rows[0]?.fields, options.kind, intervalEnding, options.dateOrder);
  if ('reason' in columns) {
    issues.add('structure', header.line, `Line ${header.line}: ${columns.reason}`);
    return failure(issues);
  }

  const timed = readTimedRows(
    table.rows,
    {
      timeColumn: columns.timeColumn,
      valueColumn: columns.valueColumn,
      columnCount: headerCells.length,
      valueHeader: headerCells[columns.valueColumn] ?? '',
      decimalComma: table.delimiter === ';',
      decimalSeparator: options.decimalSeparator,
      dateOrder: options.dateOrder,
      fillGaps,
      clock,
    },
    issues,
  );
  const series = checkSequence(timed.rows, fillGaps, issues);
  checkValueRange(timed.rows, options.kind, unit, issues);
  if (series === null || issues.count > 0) return failure(issues);

  const { values, stepMinutes } = series;
  for (const end of [0, values.length - 1]) {
    if (!Number.isNaN(values[end])) continue;
    const row = timed.rows.find((r) => r.ms === series.firstMs + end * stepMinutes * 60_000);
    const line = row?.line ?? header.line + 1;
    issues.add(
      'gap',
      line,
      `Line ${line}: the ${end === 0 ? 'first' : 'last'} value is empty; gap filling needs a value before and after each missing interval. Enter a number on this line.`,
    );
  }
  if (issues.count > 0) return failure(issues);

  const filledIndexes = fillGapsLinearly(values);
  const startMs = series.firstMs - (intervalEnding ? stepMinutes * 60_000 : 0);
  const factor = canonicalFactor(unit, stepMinutes);
  const notes = describeProfile({
    table,
    columns,
    timed,
    clock,
    kind: options.kind,
    unit,
    intervalEnding,
    dateOrder: options.dateOrder,
    decimalSeparator: options.decimalSeparator,
    startMs,
    stepMinutes,
    values,
    filledIndexes,
  });
  return {
    ok: true,
    profile: {
      startMs,
      stepMinutes,
      values: factor === 1 ? values : values.map((v) => v * factor),
      unit: canonicalUnitOf(options.kind),
      filledIndexes,
      notes: currency ? [`Prices read as ${currency}, the site's currency, per ${unit.slice(9)}.`, ...notes] : notes,
    },
  };
}
