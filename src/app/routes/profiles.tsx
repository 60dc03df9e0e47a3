import { useSearchParams } from 'react-router-dom';
import { inputClass } from '@/components/form-field';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { useSites } from '@/features/sites/api/get-sites';
import { ProfilesList } from '@/features/profiles/components/profiles-list';

/** Profiles live at a site: choose the site (kept in the address as ?site=), then its list. */
export function ProfilesRoute() {
  const sites = useSites();
  const [params, setParams] = useSearchParams();
  if (sites.isPending) return <LoadingState label="Loading sites…" />;
  if (sites.isError) return <ErrorState error={sites.error} onRetry={() => void sites.refetch()} />;
  if (sites.data.length === 0)
    return <EmptyState title="No sites yet.">Profiles belong to a site: create a site first.</EmptyState>;
  const chosen = sites.data.find((s) => s.id === params.get('site')) ?? sites.data[0];
  if (!chosen) return null;
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-semibold">Profiles</h1>
      <label className="flex max-w-md flex-col gap-1 text-sm font-medium">
        Site
        <select className={inputClass} value={chosen.id} onChange={(e) => setParams({ site: e.target.value })}>
          {sites.data.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </select>
      </label>
      <ProfilesList siteId={chosen.id} timezone={chosen.timezone} currency={chosen.currency} />
    </section>
  );
}
