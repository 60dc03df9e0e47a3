import { Link } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { ScrollRegion } from '@/components/scroll-region';
import { tableClass, tdClass, thClass, theadClass } from '@/components/table-classes';
import { useSiteTime } from '@/components/use-site-time';
import { formatMoment } from '@/lib/format';
import { usePendingSignOffs } from '../api/get-pending-sign-offs';

/**
 * Submitted plans the signed-in approver may sign off (never their own submissions), oldest first.
 * The Review link leads each row, so it stays on screen however narrow the screen.
 */
export function PendingSignOffList({ enabled = true }: { enabled?: boolean }) {
  const query = usePendingSignOffs(enabled);
  const { local } = useSiteTime();
  if (!enabled) return null;
  if (query.isPending) return <LoadingState label="Loading plans awaiting your sign-off…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  if (query.data.length === 0)
    return <EmptyState title="Nothing awaits your sign-off.">Plans other people submit show up here.</EmptyState>;
  return (
    <ScrollRegion label="Plans awaiting my sign-off (scrolls sideways)" className="rounded-lg border border-ink-100 bg-white">
      <table className={tableClass}>
        <caption className="sr-only">Plans awaiting my sign-off</caption>
        <thead className={theadClass}>
          <tr>
            <th scope="col" className={thClass}>
              Plan
            </th>
            <th scope="col" className={thClass}>
              Delivery window
            </th>
            <th scope="col" className={thClass}>
              Submitted by
            </th>
            <th scope="col" className={thClass}>
              Submitted
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-ink-100">
          {query.data.map((p) => (
            <tr key={p.planId}>
              <td className={tdClass}>
                <Link
                  to={`/plans/${p.planId}`}
                  className="font-semibold whitespace-nowrap text-seaglass-700 underline"
                  aria-label={`Review the plan for ${p.batteryName} at ${p.siteName}`}
                >
                  Review
                </Link>
                <span className="block text-ink-900">{p.batteryName}</span>
                <span className="block text-xs text-ink-500">{p.siteName}</span>
              </td>
              <td className={`${tdClass} tabular-nums`}>
                <span className="block whitespace-nowrap">{local(p.deliveryStart, p.siteId)} –</span>
                <span className="block whitespace-nowrap">{local(p.deliveryEnd, p.siteId)}</span>
              </td>
              <td className={tdClass}>{p.submittedBy.name ?? p.submittedBy.email}</td>
              <td className={`${tdClass} whitespace-nowrap tabular-nums`}>{p.submittedAt ? formatMoment(p.submittedAt) : ''}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
