/** Plans with their status and job, filtered by site, sign-off status and job state. */
import { Link, useSearchParams } from 'react-router-dom';
import { planStatuses, type PlanStatusName } from '@shared/schemas/plan';
import { inputClass } from '@/components/form-field';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { SiteFilter } from '@/components/run-source-fields';
import { useCan } from '@/lib/authorization';
import { usePlans, type PlanFilters } from '../api/get-plans';
import { PlansTable } from './plans-table';

const jobStates = ['active', 'completed', 'failed'] as const;

export function PlansPage() {
  const [params, setParams] = useSearchParams();
  const canPlan = useCan('data.edit');
  const filters: PlanFilters = {
    siteId: params.get('siteId') ?? undefined,
    status: (params.get('status') as PlanStatusName | null) ?? undefined,
    jobState: (params.get('jobState') as PlanFilters['jobState'] | null) ?? undefined,
    limit: 100,
  };
  const plans = usePlans(filters);
  const setFilter = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next);
  };
  return (
    <section className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-semibold text-ink-900">Plans</h1>
        {canPlan && (
          <Link
            to="/plans/new"
            className="rounded bg-seaglass-700 px-4 py-2 text-sm font-semibold text-white hover:bg-seaglass-800"
          >
            New plan
          </Link>
        )}
      </div>
      <div className="grid gap-3 sm:grid-cols-3" role="search">
        <SiteFilter value={filters.siteId ?? ''} onChange={(id) => setFilter('siteId', id)} />
        <label className="text-sm">
          Status
          <select className={inputClass} value={filters.status ?? ''} onChange={(e) => setFilter('status', e.target.value)}>
            <option value="">Any status</option>
            {planStatuses.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm">
          Computation
          <select className={inputClass} value={filters.jobState ?? ''} onChange={(e) => setFilter('jobState', e.target.value)}>
            <option value="">Any</option>
            {jobStates.map((s) => (
              <option key={s} value={s}>
                {s === 'active' ? 'queued or running' : s}
              </option>
            ))}
          </select>
        </label>
      </div>
      {plans.isPending ? (
        <LoadingState label="Loading plans…" />
      ) : plans.isError ? (
        <ErrorState error={plans.error} onRetry={() => void plans.refetch()} />
      ) : plans.data.length === 0 ? (
        <EmptyState title="No plans match these filters" />
      ) : (
        <PlansTable plans={plans.data} />
      )}
    </section>
  );
}
