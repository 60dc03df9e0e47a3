export interface UploadIssue {
  line?: number | undefined;
  message: string;
}

/** Problems found in a file, one row per line of the file (line 0 = the form, not the file). */
export function UploadIssuesTable({ title, issues, hint }: { title: string; issues: UploadIssue[]; hint?: string | undefined }) {
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
        <tbody>
          {issues.map((issue, k) => (
            <tr key={k} className="border-t border-ink-100 align-top">
              <td className="px-3 py-1.5 tabular-nums">{issue.line === undefined || issue.line === 0 ? 'form' : issue.line}</td>
              <td className="px-3 py-1.5">{issue.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {hint && <p className="border-t border-ink-100 px-3 py-2 text-sm text-ink-800">{hint}</p>}
    </section>
  );
}
