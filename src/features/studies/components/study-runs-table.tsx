import type { StudyResults } from '@shared/schemas/study';
import { formatCount, formatDuration, formatFixed, formatMoney, formatNumber, formatPercent } from '@/lib/format';
import { ScrollRegion } from '@/components/scroll-region';
import { numClass, tableClass, theadClass } from '@/components/table-classes';

/** Every closed-loop run: the numbers behind the charts. */
export function StudyRunsTable({ results, currency }: { results: StudyResults; currency: string }) {
  const runs = [...results.runs].sort((a, b) => a.horizonHours - b.horizonHours || a.terminal.localeCompare(b.terminal));
  const rec = results.recommendation;
  return (
    <ScrollRegion label="Runs table (scrolls sideways)">
      <table className={tableClass}>
        <caption className="px-2 py-1 text-left text-xs text-ink-500">
          Reference path over the period: {formatMoney(results.referenceCost, currency)} (
          {formatNumber(results.referenceEquivalentCycles, 1)} equivalent cycles)
        </caption>
        <thead className={theadClass}>
          <tr>
            {[
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
            ].map((h, k) => (
              <th key={h} scope="col" className={`px-2 py-1.5 align-bottom ${k >= 2 && k <= 9 ? numClass : ''}`}>
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {runs.map((r) => {
            const chosen = rec?.horizonHours === r.horizonHours && rec.terminal === r.terminal;
            return (
              <tr
                key={`${r.horizonHours}/${r.terminal}`}
                className={`border-t border-ink-100 ${chosen ? 'bg-seaglass-100 font-semibold' : ''}`}
              >
                <td className="px-2 py-1">{r.horizonHours} h</td>
                <td className="px-2 py-1">{r.terminal}</td>
                <td className={`px-2 py-1 ${numClass}`}>
                  {r.status === 'optimal' ? formatMoney(r.cost, currency) : <span className="text-brick-700">{r.message}</span>}
                </td>
                <td className={`px-2 py-1 ${numClass}`}>{r.gapPct === null ? '–' : `${formatFixed(r.gapPct, 3)} %`}</td>
                <td className={`px-2 py-1 ${numClass}`}>{formatFixed(r.equivalentCycles, 1)}</td>
                <td className={`px-2 py-1 ${numClass}`}>{formatPercent(r.nearSteadyShare)}</td>
                <td className={`px-2 py-1 ${numClass}`}>
                  {formatFixed(r.meanLeavingArcSteps, 1)} {r.meanLeavingArcSteps === 1 ? 'step' : 'steps'}
                </td>
                <td className={`px-2 py-1 ${numClass}`}>{formatCount(r.leavingIntoCommitted)}</td>
                <td className={`px-2 py-1 ${numClass}`}>{formatCount(r.solves)}</td>
                <td className={`px-2 py-1 ${numClass}`}>{formatDuration(r.seconds)}</td>
                <td className="px-2 py-1">{r.method}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
