import { Link } from 'react-router-dom';
import type { Study } from '@shared/schemas/study';
import { TableHead } from '@/components/data-table';
import { useSiteTime } from '@/components/use-site-time';
import { formatPercent } from '@/lib/format';

/** One row per study: battery, period in the site's time, horizons and rules, state and recommendation. */
export function StudiesTable({ studies }: { studies: Study[] }) {
  const { local } = useSiteTime();
  return (
    <table className="w-full rounded bg-white text-left text-sm shadow-sm">
      <TableHead headers={['Battery', 'Period (site time)', 'Horizons', 'State', 'Recommendation']} cellClassName="px-2 py-1.5" />
      <tbody>
        {studies.map((s) => (
          <tr key={s.id} className="border-t border-ink-100">
            <td className="px-2 py-1">
              <Link to={`/studies/${s.id}`} className="font-semibold text-seaglass-700 underline">
                {s.batteryName}
              </Link>
              <span className="block text-xs text-ink-500">{s.siteName}</span>
            </td>
            <td className="px-2 py-1">
              {local(s.start, s.siteId)} – {local(s.end, s.siteId)}
            </td>
            <td className="px-2 py-1">
              {s.horizonsHours.join(', ')} h × {s.terminalRules.join(', ')}
            </td>
            <td className="px-2 py-1">{s.status === 'running' ? `running ${formatPercent(s.job?.shareDone)}` : s.status}</td>
            <td className="px-2 py-1">
              {s.recommendation?.horizonHours != null ? `${s.recommendation.horizonHours} h, ${s.recommendation.terminal}` : '–'}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
