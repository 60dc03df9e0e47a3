/**
 * How a table of upload problems reads: the Line column gives the line, so a message does not
 * start with "Line 12:" again; and many lines with the same problem (24 times "not an ISO 8601
 * time", say) become one summary with the first few lines, instead of a wall of repeats.
 */
export interface UploadIssue {
  line?: number | undefined;
  message: string;
}

export type IssueEntry =
  | { kind: 'one'; line: number | undefined; message: string }
  | { kind: 'many'; lines: number[]; first: { line: number | undefined; message: string }[]; more: number[] };

/** Groups of at least this many lines are summarised. */
export const SUMMARY_FROM = 4;
/** Lines of a summarised group shown in full. */
export const SHOWN_OF_GROUP = 3;

/** The message without its leading "Line N:" or "Line N" (then "This line …"). */
export function withoutLine(message: string, line: number | undefined): string {
  if (line === undefined || line === 0) return message;
  const colon = `Line ${line}: `;
  if (message.startsWith(colon)) {
    const rest = message.slice(colon.length);
    return `${rest.charAt(0).toUpperCase()}${rest.slice(1)}`;
  }
  const bare = `Line ${line} `;
  return message.startsWith(bare) ? `This line ${message.slice(bare.length)}` : message;
}

/** The problem itself: the message with quoted cell text and numbers taken out. */
function problemOf(issue: UploadIssue): string {
  return withoutLine(issue.message, issue.line)
    .replace(/"[^"]*"/g, '"…"')
    .replace(/\d+/g, '#');
}

export function groupIssues(issues: readonly UploadIssue[]): IssueEntry[] {
  const groups = new Map<string, UploadIssue[]>();
  for (const issue of issues) {
    const key = problemOf(issue);
    const group = groups.get(key);
    if (group) group.push(issue);
    else groups.set(key, [issue]);
  }
  const entries: IssueEntry[] = [];
  for (const group of groups.values()) {
    const shown = group.map((i) => ({ line: i.line, message: withoutLine(i.message, i.line) }));
    if (group.length < SUMMARY_FROM) {
      for (const one of shown) entries.push({ kind: 'one', ...one });
      continue;
    }
    const lines = group.map((i) => i.line ?? 0);
    entries.push({ kind: 'many', lines, first: shown.slice(0, SHOWN_OF_GROUP), more: lines.slice(SHOWN_OF_GROUP) });
  }
  // Problems in file order: each entry where its first line is.
  const firstLine = (e: IssueEntry) => (e.kind === 'one' ? (e.line ?? 0) : (e.lines[0] ?? 0));
  return entries.sort((a, b) => firstLine(a) - firstLine(b));
}

/** "5–25" or "3, 7, 9–12": line numbers as runs. */
export function describeLines(lines: readonly number[]): string {
  const runs: string[] = [];
  for (let i = 0; i < lines.length;) {
    let j = i;
    while (j + 1 < lines.length && lines[j + 1] === (lines[j] ?? 0) + 1) j += 1;
    runs.push(i === j ? String(lines[i]) : `${lines[i]}–${lines[j]}`);
    i = j + 1;
  }
  return runs.length > 6 ? `${runs.slice(0, 6).join(', ')} and ${runs.length - 6} more` : runs.join(', ');
}
