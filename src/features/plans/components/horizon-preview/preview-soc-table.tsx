import type { HorizonPreview } from '@shared/schemas/horizon-preview';
import type { PlanResults } from '@shared/schemas/plan';
import { formatLocalTime, formatNumber } from '@/lib/format';
import { socRows } from './preview-series';

/** The numbers behind the preview chart, folded away until asked for. */
export function PreviewSocTable({
  results,
  preview,
  timeZone,
}: {
  results: PlanResults;
  preview: HorizonPreview;
  timeZone: string;
}) {
  const rows = socRows(results, preview);
  return (
    <details className="rounded bg-white p-2 text-sm shadow-sm">
      <summary className="cursor-pointer px-2 font-medium text-ink-800">
        SoC numbers behind the chart ({rows.length} steps)
      </summary>
      <div className="max-h-80 overflow-auto">
        <table className="w-full text-left tabular-nums" aria-label="SoC of the plan and of the preview at the end of each step">
          <thead className="sticky top-0 bg-white text-ink-600">
            <tr>
              <th scope="col" className="px-2 py-1">
                End of step
              </th>
              <th scope="col" className="px-2 py-1">
                Part
              </th>
              <th scope="col" className="px-2 py-1 text-right">
                Plan SoC %
              </th>
              <th scope="col" className="px-2 py-1 text-right">
                Preview SoC % ({formatNumber(preview.horizonHours, 2)} h)
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.tEnd} className="border-t border-ink-100">
                <td className="px-2 py-0.5">{formatLocalTime(r.tEnd, timeZone)}</td>
                <td className="px-2 py-0.5">{r.delivery ? 'delivery' : 'lookahead'}</td>
                <td className="px-2 py-0.5 text-right">{formatNumber(r.plan, 1)}</td>
                <td className="px-2 py-0.5 text-right">{formatNumber(r.preview, 1)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </details>
  );
}
