import { Link } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { ScrollRegion } from '@/components/scroll-region';
import { numClass, tableClass, tdClass, thClass, theadClass } from '@/components/table-classes';
import { formatNumber } from '@/lib/format';
import { useSites } from '../api/get-sites';

const kw = (value: number | null) => (value === null ? 'no limit' : `${formatNumber(value, 1)} kW`);

export function SitesList() {
  const sites = useSites();
  if (sites.isPending) return <LoadingState label="Loading sites…" />;
  if (sites.isError) return <ErrorState error={sites.error} onRetry={() => void sites.refetch()} />;
  if (sites.data.length === 0) {
    return (
      <EmptyState title="No sites yet.">
        Create a site to describe a grid connection, then add its batteries and upload profiles.
      </EmptyState>
    );
  }
  return (
    <ScrollRegion label="Sites table (scrolls sideways)">
      <table className={tableClass}>
        <caption className="sr-only">Sites</caption>
        <thead className={theadClass}>
          <tr>
            <th scope="col" className={thClass}>
              Site
            </th>
            <th scope="col" className={thClass}>
              Time zone
            </th>
            <th scope="col" className={`${thClass} ${numClass}`}>
              Import limit
            </th>
            <th scope="col" className={`${thClass} ${numClass}`}>
              Export limit
            </th>
            <th scope="col" className={`${thClass} ${numClass}`}>
              Batteries
            </th>
            <th scope="col" className={`${thClass} ${numClass}`}>
              Profiles
            </th>
          </tr>
        </thead>
        <tbody>
          {sites.data.map((site) => (
            <tr key={site.id} className="border-t border-ink-100">
              <td className={tdClass}>
                <Link to={`/sites/${site.id}`} className="font-medium text-seaglass-700 underline-offset-2 hover:underline">
                  {site.name}
                </Link>
              </td>
              <td className={tdClass}>{site.timezone}</td>
              <td className={`${tdClass} ${numClass}`}>{kw(site.importLimitKw)}</td>
              <td className={`${tdClass} ${numClass}`}>{kw(site.exportLimitKw)}</td>
              <td className={`${tdClass} ${numClass}`}>{site.batteryCount}</td>
              <td className={`${tdClass} ${numClass}`}>{site.profileCount}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
