import { Link } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { usePendingSignOffs } from '../api/get-pending-sign-offs';
import { formatMoment } from '@/lib/format';
import { useSiteTime } from '@/components/use-site-time';

/** Submitted plans the signed-in approver may sign off (never their own submissions), oldest first. */
export function PendingSignOffList({ enabled = true }: { enabled?: boolean }) {
  const query = usePendingSignOffs(enabled);
  const { local } = useSiteTime();
  if (!enabled) return null;
  if (query.isPending) return <LoadingState label="Loading plans awaiting your sign-off…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  if (query.data.length === 0)
    return <EmptyState title="Nothing awaits your sign-off.">Plans other people submit show up here.</EmptyState>;
  return (
    <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Plans awaiting my sign-off</caption>
        <thead className="bg-ink-50 text-ink-700">
          <tr>
            <th className="px-3 py-2">Site</th>
            <th className="px-3 py-2">Battery</th>
            <th className="px-3 py-2">Delivery window</th>
            <th className="px-3 py-2">Submitted by</th>
            <th className="px-3 py-2">Submitted</th>
            <th className="px-3 py-2">
              <span className="sr-only">Open</span>
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-ink-100">
          {query.data.map((p) => (
            <tr key={p.planId}>
              <td className="px-3 py-2">{p.siteName}</td>
              <td className="px-3 py-2">{p.batteryName}</td>
              <td className="px-3 py-2">
                {local(p.deliveryStart, p.siteId)} – {local(p.deliveryEnd, p.siteId)}
              </td>
              <td className="px-3 py-2">{p.submittedBy.name ?? p.submittedBy.email}</td>
              <td className="px-3 py-2">{p.submittedAt ? formatMoment(p.submittedAt) : ''}</td>
              <td className="px-3 py-2">
                <Link to={`/plans/${p.planId}`} className="font-semibold text-seaglass-700 underline">
                  Review
                </Link>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
