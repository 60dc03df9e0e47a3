/**
 * Checks that the rows form one regular series: no duplicate intervals,
 * ascending order, a single supported step (5, 15, 30 or 60 minutes), and no
 * missing intervals unless the caller fills them. Returns the values on the
 * regular grid, NaN where an interval is missing or its value was blank.
 */
import type { IssueList } from './issue-list';

export interface TimedRow {
  readonly line: number;
  /** Start-of-label instant in epoch ms; NaN when the time could not be read (already reported). */
  readonly ms: number;
  /** Value in the upload unit; NaN when blank or unreadable. */
  readonly value: number;
  readonly timeText: string;
}

export interface RegularSeries {
  readonly firstMs: number;
  readonly stepMinutes: number;
  /** One entry per interval from firstMs; NaN where no value was given. */
  readonly values: number[];
}

export const SUPPORTED_STEPS_MINUTES = [5, 15, 30, 60] as const;
const MINUTE_MS = 60_000;

export function describeDuration(ms: number): string {
  const minutes = ms / MINUTE_MS;
  if (minutes % 60 === 0) return minutes === 60 ? '1 hour' : `${minutes / 60} hours`;
  if (Number.isInteger(minutes)) return minutes === 1 ? '1 minute' : `${minutes} minutes`;
  return `${ms / 1000} seconds`;
}

const at = (row: TimedRow): string => `line ${row.line} (${row.timeText})`;

interface Indexed {
  readonly row: TimedRow;
  /** Position among all rows, and how many unreadable rows came before it. */
  readonly index: number;
  readonly unreadableBefore: number;
}

/**
 * The most frequent difference between neighbouring rows with no unreadable
 * row between them; ties go to the shorter one. Null when no such pair exists.
 */
function commonStep(rows: readonly Indexed[]): { stepMs: number; example: Indexed; previous: Indexed } | null {
  const counts = new Map<number, { n: number; example: Indexed; previous: Indexed }>();
  for (let i = 1; i < rows.length; i += 1) {
    const cur = rows[i] as Indexed;
    const previous = rows[i - 1] as Indexed;
    if (cur.unreadableBefore !== previous.unreadableBefore) continue;
    const diff = cur.row.ms - previous.row.ms;
    const entry = counts.get(diff);
    if (entry) entry.n += 1;
    else counts.set(diff, { n: 1, example: cur, previous });
  }
  let found: { stepMs: number; example: Indexed; previous: Indexed; n: number } | null = null;
  for (const [stepMs, entry] of counts) {
    if (!found || entry.n > found.n || (entry.n === found.n && stepMs < found.stepMs)) found = { stepMs, ...entry };
  }
  return found;
}

export function checkSequence(rows: readonly TimedRow[], fillGaps: boolean, issues: IssueList): RegularSeries | null {
  let unreadable = 0;
  // Most files are strictly ascending: a row later than every earlier one cannot
  // repeat one, so the instant map is only built once a row breaks that.
  let latestMs = Number.NEGATIVE_INFINITY;
  let byInstant: Map<number, TimedRow> | null = null;
  const unique: Indexed[] = [];
  rows.forEach((row, index) => {
    if (Number.isNaN(row.ms)) {
      unreadable += 1;
      return;
    }
    if (row.ms <= latestMs) {
      byInstant ??= new Map(unique.map((u) => [u.row.ms, u.row]));
      const first = byInstant.get(row.ms);
      if (first) {
        issues.add(
          'order',
          row.line,
          `Line ${row.line}: the time ${row.timeText} is the same interval as ${at(first)}. Keep only one of the two rows.`,
        );
        return;
      }
    }
    latestMs = Math.max(latestMs, row.ms);
    byInstant?.set(row.ms, row);
    unique.push({ row, index, unreadableBefore: unreadable });
  });

  let outOfOrder = false;
  for (let i = 1; i < unique.length; i += 1) {
    const prev = (unique[i - 1] as Indexed).row;
    const cur = (unique[i] as Indexed).row;
    if (cur.ms < prev.ms) {
      outOfOrder = true;
      issues.add(
        'order',
        cur.line,
        `Line ${cur.line}: ${cur.timeText} is earlier than ${at(prev)}. Sort the rows by time, earliest first.`,
      );
    }
  }
  // Gaps and steps measured on unsorted rows would only repeat the same problem.
  if (outOfOrder) return null;

  const first = unique[0];
  if (first === undefined) return null;
  if (rows.length === 1) {
    issues.add(
      'structure',
      first.row.line,
      `Line ${first.row.line} is the only data row; at least two rows are needed to tell the resolution. Upload the whole series.`,
    );
    return null;
  }
  // Null only when unreadable rows separate every pair: those are already reported.
  const common = commonStep(unique);
  if (common === null) return null;
  const { stepMs, example, previous } = common;
  const stepMinutes = stepMs / MINUTE_MS;
  if (!(SUPPORTED_STEPS_MINUTES as readonly number[]).includes(stepMinutes)) {
    issues.add(
      'step',
      example.row.line,
      `Line ${example.row.line} is ${describeDuration(stepMs)} after ${at(previous.row)}, the most common step in this file; Slackwater takes 5, 15, 30 or 60 minute intervals. Resample the series to one of these.`,
    );
    return null;
  }

  let irregular = false;
  let anchor = first;
  const onGrid: TimedRow[] = [first.row];
  for (let i = 1; i < unique.length; i += 1) {
    const cur = unique[i] as Indexed;
    const diff = cur.row.ms - anchor.row.ms;
    if (diff % stepMs === 0) {
      const missing = diff / stepMs - 1;
      // A jump across unreadable rows is those rows, already reported, not a gap.
      const acrossUnreadable = cur.unreadableBefore > anchor.unreadableBefore;
      if (missing > 0 && !fillGaps && !acrossUnreadable) {
        const what =
          missing === 1 ? `1 interval of ${stepMinutes} minutes is` : `${missing} intervals of ${stepMinutes} minutes are`;
        issues.add(
          'gap',
          cur.row.line,
          `Line ${cur.row.line}: ${cur.row.timeText} comes ${describeDuration(diff)} after ${at(anchor.row)}, so ${what} missing. Add the missing rows, or upload with gap filling turned on.`,
        );
      }
      anchor = cur;
      onGrid.push(cur.row);
      continue;
    }
    irregular = true;
    issues.add(
      'step',
      cur.row.line,
      `Line ${cur.row.line}: ${cur.row.timeText} comes ${describeDuration(diff)} after ${at(anchor.row)}, which is not a whole number of ${stepMinutes}-minute intervals. Correct the time so every row is ${stepMinutes} minutes after the previous one.`,
    );
    // A stray row leaves the grid intact; a shifted series continues from here.
    const next = unique[i + 1];
    if (next === undefined || (next.row.ms - anchor.row.ms) % stepMs !== 0) anchor = cur;
  }
  if (irregular) return null;

  const firstMs = first.row.ms;
  const lastMs = anchor.row.ms;
  const values = new Array<number>((lastMs - firstMs) / stepMs + 1).fill(Number.NaN);
  for (const row of onGrid) values[(row.ms - firstMs) / stepMs] = row.value;
  return { firstMs, stepMinutes, values };
}
