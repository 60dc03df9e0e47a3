import { ErrorState, LoadingState } from '@/components/query-state';
import { exportPlanUrl } from '../api/export-plan-url';
import { useSignOff } from '../api/get-sign-off';
import { PlanStatusBadge } from './plan-status-badge';
import { SignOffActions } from './sign-off-actions';
import { SignOffCautionsReminder } from './sign-off-cautions';
import { SignOffFacts } from './sign-off-facts';
import { SignOffHistory } from './sign-off-history';

/**
 * The sign-off section of a plan page: status, who submitted and signed off,
 * when, the checksum, the actions the user may take, the CSV export, the full
 * history, and a pointer to the plan page's cautions (docs/model.md) just above
 * it. Composed into the plan page by the route (features do not import each other).
 */
export function SignOffPanel({ planId }: { planId: string }) {
  const query = useSignOff(planId);
  if (query.isPending) return <LoadingState label="Loading the sign-off…" />;
  if (query.isError)
    return <ErrorState error={query.error} onRetry={() => void query.refetch()} title="The sign-off could not be loaded." />;
  const record = query.data;
  const notApproved = record.status !== 'approved';
  return (
    <section aria-labelledby="sign-off-heading" className="space-y-4 rounded-lg border border-ink-100 bg-ink-50 p-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="sign-off-heading" className="text-xl font-semibold text-ink-900">
          Sign-off
        </h2>
        <PlanStatusBadge status={record.status} />
      </div>
      <SignOffCautionsReminder cautionsId="cautions-heading" />
      <SignOffFacts record={record} />
      <SignOffActions record={record} />
      {record.can.export && (
        <p className="text-sm text-ink-700">
          <a href={exportPlanUrl(planId)} download className="font-semibold text-seaglass-700 underline">
            Export the schedule as CSV
          </a>
          {notApproved && <span className="ml-2 font-semibold text-amber-700">The file will be marked NOT APPROVED.</span>}
        </p>
      )}
      <div>
        <h3 className="mb-2 font-semibold text-ink-800">History</h3>
        <SignOffHistory events={record.events} />
      </div>
    </section>
  );
}
