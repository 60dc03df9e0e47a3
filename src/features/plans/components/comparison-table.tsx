import { Link } from 'react-router-dom';
import type { Plan } from '@shared/schemas/plan';
import { formatMoney, formatNumber, formatPercent, formatSteps } from '@/lib/format';
import { ruleLabel } from './comparison-labels';
import { ScrollRegion } from '@/components/scroll-region';
import { TableHead } from '@/components/data-table';

/**
 * The plan the others are measured against: the longest horizon computed, the same rule preferred
 * among equally long ones. Far enough ahead the terminal rule hardly matters (the turnpike property),
 * so the longest plan stands for "what more lookahead would do", whatever its rule.
 */
function longestFor(plan: Plan, plans: Plan[]): Plan | undefined {
  return plans
    .filter((p) => p.results)
    .sort(
      (a, b) =>
        b.horizonHours - a.horizonHours ||
        Number(b.terminalRule === plan.terminalRule) - Number(a.terminalRule === plan.terminalRule),
    )[0];
}

/** Largest SoC difference over the delivery window against the longest plan, % of nameplate. */
function differenceToLongest(plan: Plan, plans: Plan[]): number | null {
  const longest = longestFor(plan, plans);
  if (!longest?.results || !plan.results || longest.id === plan.id) return null;
  const n = Math.min(plan.results.deliverySteps, longest.results.deliverySteps);
  let max = 0;
  for (let t = 0; t < n; t++) max = Math.max(max, Math.abs(plan.results.steps[t]!.socPct - longest.results.steps[t]!.socPct));
  return max;
}

export function ComparisonTable({ plans }: { plans: Plan[] }) {
  const currency = plans[0]?.inputs?.site.currency ?? '';
  return (
    <ScrollRegion label="Comparison table (scrolls sideways)">
      <table className="w-full rounded bg-white text-left text-sm shadow-sm">
        <caption className="sr-only">Plans of this delivery window by horizon and terminal rule</caption>
        <TableHead
          headers={[
            'Horizon',
            'Terminal rule',
            'Method',
            'Cost',
            'Earnings',
            'Near-steady',
            'Entry arc',
            'Leaving arc',
            'Commit window',
            'Max SoC gap to longest plan',
            'Flags',
          ]}
        />
        <tbody>
          {plans.map((p) => {
            const r = p.results;
            const step = r?.stepMinutes ?? 60;
            const gap = differenceToLongest(p, plans);
            return (
              <tr key={p.id} className="border-t border-ink-100 tabular-nums">
                <td className="px-2 py-1">
                  <Link to={`/plans/${p.id}`} className="font-semibold text-seaglass-700 underline">
                    {p.horizonHours} h
                  </Link>
                </td>
                <td className="px-2 py-1">{ruleLabel(p)}</td>
                <td className="px-2 py-1">{p.method ?? p.job?.state ?? ''}</td>
                <td className="px-2 py-1">{formatMoney(r?.summary.cost, currency)}</td>
                <td className="px-2 py-1">{formatMoney(r?.summary.earnings, currency)}</td>
                <td className="px-2 py-1">{formatPercent(r?.turnpike.nearSteadyShare)}</td>
                <td className="px-2 py-1">{r ? formatSteps(r.turnpike.entryArcSteps, step) : '–'}</td>
                <td className="px-2 py-1">{r ? formatSteps(r.turnpike.leavingArcSteps, step) : '–'}</td>
                <td className="px-2 py-1">
                  {r && r.turnpike.commitWindowSteps !== null ? formatSteps(r.turnpike.commitWindowSteps, step) : '–'}
                </td>
                <td className="px-2 py-1">{gap === null ? '–' : `${formatNumber(gap, 1)} %`}</td>
                <td className="px-2 py-1">
                  {/* Flagged plans stand out in amber; the flags' words are on the plan page. */}
                  {r && r.turnpike.flags.length > 0 ? (
                    <span
                      className="rounded bg-amber-100 px-1.5 py-0.5 font-semibold text-amber-700"
                      title={r.turnpike.flags.join('\n')}
                    >
                      {r.turnpike.flags.length} {r.turnpike.flags.length === 1 ? 'flag' : 'flags'}
                    </span>
                  ) : r ? (
                    'none'
                  ) : (
                    '–'
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
