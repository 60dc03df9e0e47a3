import { describeLines, groupIssues, type UploadIssue } from '../lib/issue-groups';

export type { UploadIssue };

const lineText = (line: number | undefined) => (line === undefined || line === 0 ? 'form' : line);

/**
 * Problems found in a file, one row per line of the file (line 0 = the form, not the file); many
 * lines with the same problem are summarised above their first few.
 */
export function UploadIssuesTable({ title, issues, hint }: { title: string; issues: UploadIssue[]; hint?: string | undefined }) {
  const entries = groupIssues(issues);
  return (
    <section role="alert" aria-label={title} className="rounded border border-brick-600 bg-white">
      <h3 className="bg-brick-100 px-3 py-2 font-semibold text-brick-700">{title}</h3>
      <table className="w-full text-left text-sm">
        <thead className="text-ink-700">
          <tr>
            <th scope="col" className="w-20 px-3 py-1.5">
              Line
            </th>
            <th scope="col" className="px-3 py-1.5">
              Problem
            </th>
          </tr>
        </thead>
        {entries.map((entry, k) =>
          entry.kind === 'one' ? (
            <tbody key={k}>
              <tr className="border-t border-ink-100 align-top">
                <td className="px-3 py-1.5 tabular-nums">{lineText(entry.line)}</td>
                <td className="px-3 py-1.5">{entry.message}</td>
              </tr>
            </tbody>
          ) : (
            <tbody key={k} className="border-t border-ink-100">
              <tr className="bg-ink-50 align-top">
                <th scope="rowgroup" colSpan={2} className="px-3 py-1.5 font-semibold text-ink-900">
                  {entry.lines.length} lines have the same problem (lines {describeLines(entry.lines)}); the first{' '}
                  {entry.first.length}:
                </th>
              </tr>
              {entry.first.map((one) => (
                <tr key={one.line} className="align-top">
                  <td className="px-3 py-1 pl-6 tabular-nums">{lineText(one.line)}</td>
                  <td className="px-3 py-1">{one.message}</td>
                </tr>
              ))}
              <tr>
                <td colSpan={2} className="px-3 py-1 pb-2 pl-6 text-ink-700">
                  … and {entry.more.length} more {entry.more.length === 1 ? 'line' : 'lines'} like these:{' '}
                  {describeLines(entry.more)}.
                </td>
              </tr>
            </tbody>
          ),
        )}
      </table>
      {hint && <p className="border-t border-ink-100 px-3 py-2 text-sm text-ink-800">{hint}</p>}
    </section>
  );
}
