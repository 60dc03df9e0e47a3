/** Horizon studies with their state, filtered by site and state. */
import type { JobState } from '@shared/schemas/job';
import { JobStateFilter, RunListPage, useFilterParams } from '@/components/run-list-page';
import { SiteFilter } from '@/components/run-source-fields';
import { useCan } from '@/lib/authorization';
import { useStudies } from '../api/get-studies';
import { StudiesTable } from './studies-table';

export function StudiesPage() {
  const { params, setFilter } = useFilterParams();
  const canRun = useCan('data.edit');
  const siteId = params.get('siteId') ?? undefined;
  const status = (params.get('status') as JobState | 'active' | null) ?? undefined;
  return (
    <RunListPage
      title="Horizon studies"
      create={canRun ? { to: '/studies/new', label: 'New study' } : null}
      filterColumns="sm:grid-cols-2"
      filters={
        <>
          <SiteFilter value={siteId ?? ''} onChange={(id) => setFilter('siteId', id)} />
          <JobStateFilter label="State" value={status ?? ''} onChange={(s) => setFilter('status', s)} />
        </>
      }
      query={useStudies({ siteId, status })}
      loadingLabel="Loading studies…"
      emptyTitle="No studies match these filters"
    >
      {(studies) => <StudiesTable studies={studies} />}
    </RunListPage>
  );
}
