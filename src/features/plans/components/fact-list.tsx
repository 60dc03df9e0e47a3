/** Term and text pairs in two columns, as the plan page states its facts and figures. */
export function FactList({ rows, label }: { rows: readonly (readonly [string, string])[]; label?: string }) {
  return (
    <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[auto_1fr]" aria-label={label}>
      {rows.map(([term, text]) => (
        <div key={term} className="contents">
          <dt className="font-medium text-ink-700">{term}</dt>
          <dd className="text-ink-900">{text}</dd>
        </div>
      ))}
    </dl>
  );
}
