import { Link } from 'react-router-dom';
import type { Plan } from '@shared/schemas/plan';
import { useSiteTime } from '@/components/use-site-time';
import { formatMoney, formatPercent } from '@/lib/format';
import { ScrollRegion } from '@/components/scroll-region';
import { TableHead } from '@/components/data-table';

/** One row per plan: window, horizon, status, the job and the headline figures. */
export function PlansTable({ plans }: { plans: Plan[] }) {
  // Windows in each site's own local time: planners think in the site's clock, and sites may differ.
  const { local } = useSiteTime();
  return (
    <ScrollRegion label="Plans table (scrolls sideways)">
      <table className="w-full rounded bg-white text-left text-sm shadow-sm">
        <TableHead
          headers={[
            'Battery',
            'Delivery (site time)',
            'Horizon',
            'Rule',
            'Status',
            'Computation',
            'Cost',
            'Near-steady',
            'Flags',
          ]}
        />
        <tbody>
          {plans.map((p) => (
            <tr key={p.id} className="border-t border-ink-100 tabular-nums">
              <td className="px-2 py-1">
                <Link to={`/plans/${p.id}`} className="font-semibold text-seaglass-700 underline">
                  {p.batteryName ?? 'battery'}
                </Link>
                <span className="block text-xs text-ink-500">{p.siteName}</span>
              </td>
              <td className="whitespace-nowrap px-2 py-1">
                {local(p.deliveryStart, p.siteId)} – {local(p.deliveryEnd, p.siteId)}
              </td>
              <td className="px-2 py-1">{p.horizonHours} h</td>
              <td className="px-2 py-1">{p.terminalRule}</td>
              <td className="px-2 py-1">{p.status}</td>
              <td className="px-2 py-1">
                {p.job?.state === 'running' ? `running ${formatPercent(p.job.shareDone)}` : (p.job?.state ?? '–')}
                {p.method ? ` · ${p.method}` : ''}
              </td>
              <td className="px-2 py-1">{formatMoney(p.headline?.cost, '')}</td>
              <td className="px-2 py-1">{formatPercent(p.headline?.nearSteadyShare)}</td>
              <td className={`px-2 py-1 ${p.headline?.flags ? 'font-semibold text-amber-700' : ''}`}>
                {p.headline ? p.headline.flags : '–'}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
