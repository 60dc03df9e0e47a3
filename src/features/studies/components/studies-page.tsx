/** Horizon studies with their state, filtered by site and state. */
import { Link, useSearchParams } from 'react-router-dom';
import type { JobState } from '@shared/schemas/job';
import { inputClass } from '@/components/form-field';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { SiteFilter } from '@/components/run-source-fields';
import { ScrollRegion } from '@/components/scroll-region';
import { tableClass, theadClass } from '@/components/table-classes';
import { useSiteTime } from '@/components/use-site-time';
import { useCan } from '@/lib/authorization';
import { formatPercent } from '@/lib/format';
import { useStudies } from '../api/get-studies';

const states = ['active', 'completed', 'failed'] as const;

export function StudiesPage() {
  const [params, setParams] = useSearchParams();
  const canRun = useCan('data.edit');
  const siteId = params.get('siteId') ?? undefined;
  const status = (params.get('status') as JobState | 'active' | null) ?? undefined;
  const studies = useStudies({ siteId, status });
  const { local } = useSiteTime();
  const setFilter = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next);
  };
  return (
    <section className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-semibold text-ink-900">Horizon studies</h1>
        {canRun && (
          <Link
            to="/studies/new"
            className="rounded bg-seaglass-700 px-4 py-2 text-sm font-semibold text-white hover:bg-seaglass-800"
          >
            New study
          </Link>
        )}
      </div>
      <div className="grid gap-3 sm:grid-cols-2" role="search">
        <SiteFilter value={siteId ?? ''} onChange={(id) => setFilter('siteId', id)} />
        <label className="text-sm">
          State
          <select className={inputClass} value={status ?? ''} onChange={(e) => setFilter('status', e.target.value)}>
            <option value="">Any</option>
            {states.map((s) => (
              <option key={s} value={s}>
                {s === 'active' ? 'queued or running' : s}
              </option>
            ))}
          </select>
        </label>
      </div>
      {studies.isPending ? (
        <LoadingState label="Loading studies…" />
      ) : studies.isError ? (
        <ErrorState error={studies.error} onRetry={() => void studies.refetch()} />
      ) : studies.data.length === 0 ? (
        <EmptyState title="No studies match these filters" />
      ) : (
        <ScrollRegion label="Studies table (scrolls sideways)">
          <table className={tableClass}>
            <thead className={theadClass}>
              <tr>
                {['Battery', 'Period (site time)', 'Horizons', 'State', 'Recommendation'].map((h) => (
                  <th key={h} scope="col" className="px-2 py-1.5">
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {studies.data.map((s) => (
                <tr key={s.id} className="border-t border-ink-100">
                  <td className="px-2 py-1">
                    <Link to={`/studies/${s.id}`} className="font-semibold text-seaglass-700 underline">
                      {s.batteryName}
                    </Link>
                    <span className="block text-xs text-ink-500">{s.siteName}</span>
                  </td>
                  <td className="px-2 py-1 whitespace-nowrap tabular-nums">
                    {local(s.start, s.siteId)} – {local(s.end, s.siteId)}
                  </td>
                  <td className="px-2 py-1">
                    {s.horizonsHours.join(', ')} h × {s.terminalRules.join(', ')}
                  </td>
                  <td className="px-2 py-1">
                    {s.status === 'running' ? `running ${formatPercent(s.job?.shareDone)}` : s.status}
                  </td>
                  <td className="px-2 py-1">
                    {s.recommendation?.horizonHours != null
                      ? `${s.recommendation.horizonHours} h, ${s.recommendation.terminal}`
                      : '–'}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      )}
    </section>
  );
}
