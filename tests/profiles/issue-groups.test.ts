/**
 * The table of upload problems: the Line column carries the line, so the message does not say it
 * again, and a problem repeated on many lines is summarised with its first lines. The messages
 * are the parser's own, for a file of day-first dates uploaded without its date order.
 */
import { describe, expect, it } from 'vitest';
import { parseProfileCsv } from '@shared/profile-csv';
import { describeLines, groupIssues, withoutLine } from '../../src/features/profiles/lib/issue-groups';

/** 24 hourly rows of 08.12.2026 written day first, and one bad value among them. */
function dayFirstFile(): string {
  const rows = Array.from({ length: 24 }, (_, h) => `08.12.2026 ${String(h).padStart(2, '0')}:00;${h === 5 ? 'n/a' : `4${h},5`}`);
  return ['time;price', ...rows].join('\n');
}

describe('grouping the problems of an upload', () => {
  const result = parseProfileCsv(dayFirstFile(), { kind: 'price', unit: 'currency/MWh', timezone: 'Europe/Berlin' });
  const issues = result.ok ? [] : result.issues;

  it('turns 24 identical line errors into one summary with the first three lines', () => {
    // [D] one time problem per data row (lines 2-25), and the bad value on line 7.
    expect(issues).toHaveLength(25);
    const entries = groupIssues(issues);
    expect(entries).toHaveLength(2);
    const [times, value] = entries;
    expect(times?.kind).toBe('many');
    if (times?.kind !== 'many') return;
    expect(times.lines).toHaveLength(24);
    expect(times.first.map((f) => f.line)).toEqual([2, 3, 4]);
    expect(times.more).toHaveLength(21);
    expect(describeLines(times.lines)).toBe('2–25');
    expect(times.first[0]?.message).toMatch(/^"08\.12\.2026 00:00" is not an ISO 8601 date and time; .*date order/);
    expect(value).toMatchObject({ kind: 'one', line: 7 });
    if (value?.kind === 'one') expect(value.message).toMatch(/^"n\/a" is not a number/);
  });

  it('keeps a few similar problems as rows of their own', () => {
    const few = issues.slice(0, 3);
    expect(groupIssues(few).map((e) => e.kind)).toEqual(['one', 'one', 'one']);
  });

  it('does not repeat "Line N" inside the message', () => {
    expect(withoutLine('Line 3: the value is empty.', 3)).toBe('The value is empty.');
    expect(withoutLine('Line 3 has 1 field but the header has 2.', 3)).toBe('This line has 1 field but the header has 2.');
    expect(withoutLine('Line 4: 10:00 comes after line 3.', 3)).toBe('Line 4: 10:00 comes after line 3.');
    expect(withoutLine('Choose a unit.', 0)).toBe('Choose a unit.');
    expect(describeLines([3, 7, 8, 9, 12])).toBe('3, 7–9, 12');
  });
});
