/**
 * Values outside the range their kind allows (availability: 0–1 of the power
 * ratings), each reported with its line, in the unit of the upload. Blank and
 * unreadable values were reported by the reader already.
 */
import type { TimedRow } from './check-sequence';
import type { IssueList } from './issue-list';
import { VALUE_RANGE, canonicalFactor, type AnyProfileKind, type ProfileUnit } from './profile-units';

export function checkValueRange(rows: readonly TimedRow[], kind: AnyProfileKind, unit: ProfileUnit, issues: IssueList): void {
  const range = VALUE_RANGE[kind];
  if (range === null) return;
  // Units of kinds with a range (fraction, %) do not depend on the step.
  const factor = canonicalFactor(unit, 60);
  const [lo, hi] = range;
  for (const row of rows) {
    if (!Number.isFinite(row.value)) continue;
    const value = row.value * factor;
    if (value >= lo && value <= hi) continue;
    issues.add(
      'range',
      row.line,
      `Line ${row.line} (${row.timeText}): the ${kind} ${row.value}${unit === '%' ? ' %' : ''} is outside ${lo / factor}–${hi / factor}${unit === '%' ? ' %' : ''}; enter a value in that range.`,
    );
  }
}
