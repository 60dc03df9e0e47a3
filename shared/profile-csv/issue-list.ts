/**
 * Collects upload problems up to a cap, remembering which kinds occurred so the
 * closing hint can say how to fix them. Line 0 means the upload as a whole
 * (its options), not a line of the file.
 */

export interface ProfileIssue {
  /** Physical line in the file where the row starts (1 = header); 0 = the upload options. */
  readonly line: number;
  readonly message: string;
}

export type IssueCategory =
  'options' | 'file' | 'structure' | 'time' | 'local-time' | 'offset' | 'number' | 'range' | 'order' | 'gap' | 'step';

export const DEFAULT_MAX_ISSUES = 50;

const EXAMPLE_TIMES = "2026-03-29T03:00:00+02:00 (with UTC offset) or 2026-03-29T03:00 (local time in the site's zone)";

const CATEGORY_HINTS: Readonly<Record<IssueCategory, string>> = {
  options: 'Choose a kind and a unit from the lists offered.',
  file: 'Export the data from your spreadsheet or system as a CSV text file (UTF-8) and upload that file.',
  structure:
    'The file needs a header row, then one row per interval with a time column and a value column, separated by commas or semicolons.',
  time: `Write times in ISO 8601, e.g. ${EXAMPLE_TIMES}; for dates written day or month first (08.12.2026 00:00), choose the file's date order at upload.`,
  'local-time':
    'On daylight-saving days local times can be missing or repeated; write every time with its UTC offset (RFC 3339), e.g. 2026-10-25T02:00:00+02:00 and 2026-10-25T02:00:00+01:00.',
  offset:
    "Use the same UTC offset throughout, or the offsets of the site's time zone (they change only on its daylight-saving days).",
  number:
    'Values must be plain numbers such as -12.5 (or -12,5 in a semicolon-separated file): no units, NaN or Infinity. For thousands separators, choose the decimal separator at upload (1.010,25 or 1,010.25).',
  range: 'Availability is a fraction of the power ratings from 0 (unavailable) to 1 (fully available), or 0–100 with the unit %.',
  order: 'Sort the rows by time, earliest first, with each interval once.',
  gap: 'To fill missing intervals by linear interpolation between their neighbours, upload again with gap filling turned on.',
  step: 'Every row must be one interval after the previous one: 5, 15, 30 or 60 minutes throughout.',
};

export class IssueList {
  private readonly kept: ProfileIssue[] = [];
  private readonly seen = new Set<IssueCategory>();
  private total = 0;

  constructor(private readonly max: number) {}

  add(category: IssueCategory, line: number, message: string): void {
    this.total += 1;
    this.seen.add(category);
    if (this.kept.length < this.max) this.kept.push({ line, message });
  }

  get count(): number {
    return this.total;
  }

  issues(): ProfileIssue[] {
    // Stable sort: problems on one line keep the order they were found in.
    return [...this.kept].sort((a, b) => a.line - b.line);
  }

  hint(): string {
    const parts = ['Nothing was stored. Fix the lines listed and upload the file again.'];
    for (const category of Object.keys(CATEGORY_HINTS) as IssueCategory[]) {
      if (this.seen.has(category)) parts.push(CATEGORY_HINTS[category]);
    }
    if (this.total > this.kept.length) {
      parts.push(`Showing the first ${this.kept.length} of ${this.total} problems.`);
    }
    return parts.join(' ');
  }
}
