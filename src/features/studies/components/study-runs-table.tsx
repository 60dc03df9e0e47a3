import type { StudyResults } from '@shared/schemas/study';
import { formatDuration, formatMoney, formatNumber, formatPercent } from '@/lib/format';
import { ScrollRegion } from '@/components/scroll-region';
import { TableHead } from '@/components/data-table';

/** Every closed-loop run: the numbers behind the charts. */
export function StudyRunsTable({ results, currency }: { results: StudyResults; currency: string }) {
  const runs = [...results.runs].sort((a, b) => a.horizonHours - b.horizonHours || a.terminal.localeCompare(b.terminal));
  const rec = results.recommendation;
  return (
    <ScrollRegion label="Runs table (scrolls sideways)">
      <table className="w-full rounded bg-white text-left text-sm shadow-sm">
        <caption className="px-2 py-1 text-left text-xs text-ink-500">
          Reference path over the period: {formatMoney(results.referenceCost, currency)} (
          {formatNumber(results.referenceEquivalentCycles, 1)} equivalent cycles)
        </caption>
        <TableHead
          headers={[
            'Horizon',
            'Terminal rule',
            'Cost',
            'Gap',
            'Cycles',
            'Near-steady',
            'Mean leaving arc',
            'Leaving into commit',
            'Solves',
            'Time',
            'Method',
          ]}
        />
        <tbody>
          {runs.map((r) => {
            const chosen = rec?.horizonHours === r.horizonHours && rec.terminal === r.terminal;
            return (
              <tr
                key={`${r.horizonHours}/${r.terminal}`}
                className={`border-t border-ink-100 tabular-nums ${chosen ? 'bg-seaglass-100 font-semibold' : ''}`}
              >
                <td className="px-2 py-1">{r.horizonHours} h</td>
                <td className="px-2 py-1">{r.terminal}</td>
                <td className="px-2 py-1">
                  {r.status === 'optimal' ? formatMoney(r.cost, currency) : <span className="text-brick-700">{r.message}</span>}
                </td>
                <td className="px-2 py-1">{r.gapPct === null ? '–' : `${formatNumber(r.gapPct, 3)} %`}</td>
                <td className="px-2 py-1">{formatNumber(r.equivalentCycles, 1)}</td>
                <td className="px-2 py-1">{formatPercent(r.nearSteadyShare)}</td>
                <td className="px-2 py-1">
                  {formatNumber(r.meanLeavingArcSteps, 1)} {formatNumber(r.meanLeavingArcSteps, 1) === '1' ? 'step' : 'steps'}
                </td>
                <td className="px-2 py-1">{r.leavingIntoCommitted}</td>
                <td className="px-2 py-1">{r.solves}</td>
                <td className="px-2 py-1">{formatDuration(r.seconds)}</td>
                <td className="px-2 py-1">{r.method}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
