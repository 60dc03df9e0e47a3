/** Plans with their status and job, filtered by site, sign-off status and job state. */
import { planStatuses, type PlanStatusName } from '@shared/schemas/plan';
import { inputClass } from '@/components/form-field';
import { JobStateFilter, RunListPage, useFilterParams } from '@/components/run-list-page';
import { SiteFilter } from '@/components/run-source-fields';
import { useCan } from '@/lib/authorization';
import { usePlans, type PlanFilters } from '../api/get-plans';
import { PlansTable } from './plans-table';

export function PlansPage() {
  const { params, setFilter } = useFilterParams();
  const canPlan = useCan('data.edit');
  const filters: PlanFilters = {
    siteId: params.get('siteId') ?? undefined,
    status: (params.get('status') as PlanStatusName | null) ?? undefined,
    jobState: (params.get('jobState') as PlanFilters['jobState'] | null) ?? undefined,
    limit: 100,
  };
  return (
    <RunListPage
      title="Plans"
      create={canPlan ? { to: '/plans/new', label: 'New plan' } : null}
      filterColumns="sm:grid-cols-3"
      filters={
        <>
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
          <JobStateFilter label="Computation" value={filters.jobState ?? ''} onChange={(s) => setFilter('jobState', s)} />
        </>
      }
      query={usePlans(filters)}
      loadingLabel="Loading plans…"
      emptyTitle="No plans match these filters"
    >
      {(plans) => <PlansTable plans={plans} />}
    </RunListPage>
  );
}
