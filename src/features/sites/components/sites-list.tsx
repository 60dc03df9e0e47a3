import { Link } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { useSites } from '../api/get-sites';

const kw = (value: number | null) => (value === null ? 'no limit' : `${value.toLocaleString()} kW`);

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
    <table className="w-full overflow-hidden rounded bg-white text-left shadow-sm">
      <caption className="sr-only">Sites</caption>
      <thead className="bg-ink-100 text-sm text-ink-700">
        <tr>
          <th scope="col" className="px-3 py-2">
            Site
          </th>
          <th scope="col" className="px-3 py-2">
            Time zone
          </th>
          <th scope="col" className="px-3 py-2">
            Import / export limit
          </th>
          <th scope="col" className="px-3 py-2 text-right">
            Batteries
          </th>
          <th scope="col" className="px-3 py-2 text-right">
            Profiles
          </th>
        </tr>
      </thead>
      <tbody>
        {sites.data.map((site) => (
          <tr key={site.id} className="border-t border-ink-100">
            <td className="px-3 py-2">
              <Link to={`/sites/${site.id}`} className="font-medium text-seaglass-700 underline-offset-2 hover:underline">
                {site.name}
              </Link>
            </td>
            <td className="px-3 py-2">{site.timezone}</td>
            <td className="px-3 py-2">
              {kw(site.importLimitKw)} / {kw(site.exportLimitKw)}
            </td>
            <td className="px-3 py-2 text-right tabular-nums">{site.batteryCount}</td>
            <td className="px-3 py-2 text-right tabular-nums">{site.profileCount}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
