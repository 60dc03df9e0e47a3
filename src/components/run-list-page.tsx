/**
 * The frame of the plan and study lists: a title with the "New …" link for
 * those who may run one, filters kept in the address (so a filtered list can be
 * bookmarked or shared), and the list's loading, error and empty states.
 */
import type { ReactNode } from 'react';
import type { UseQueryResult } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router-dom';
import { inputClass } from './form-field';
import { EmptyState, ErrorState, LoadingState } from './query-state';

/** The address's query parameters and a setter that drops a filter set to ''. */
export function useFilterParams(): { params: URLSearchParams; setFilter: (key: string, value: string) => void } {
  const [params, setParams] = useSearchParams();
  const setFilter = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next);
  };
  return { params, setFilter };
}

const jobStates = ['active', 'completed', 'failed'] as const;

/** A filter on the background job's state ('active' = queued or running). */
export function JobStateFilter({ label, value, onChange }: { label: string; value: string; onChange: (state: string) => void }) {
  return (
    <label className="text-sm">
      {label}
      <select className={inputClass} value={value} onChange={(e) => onChange(e.target.value)}>
        <option value="">Any</option>
        {jobStates.map((s) => (
          <option key={s} value={s}>
            {s === 'active' ? 'queued or running' : s}
          </option>
        ))}
      </select>
    </label>
  );
}

export interface RunListPageProps<T> {
  title: string;
  /** The "New …" link, shown to those who may run one. */
  create: { to: string; label: string } | null;
  /** Grid columns of the filter row from the small breakpoint, e.g. 'sm:grid-cols-3'. */
  filterColumns: string;
  filters: ReactNode;
  query: UseQueryResult<T[]>;
  loadingLabel: string;
  emptyTitle: string;
  children: (rows: T[]) => ReactNode;
}

export function RunListPage<T>({
  title,
  create,
  filterColumns,
  filters,
  query,
  loadingLabel,
  emptyTitle,
  children,
}: RunListPageProps<T>) {
  return (
    <section className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-semibold text-ink-900">{title}</h1>
        {create && (
          <Link
            to={create.to}
            className="rounded bg-seaglass-700 px-4 py-2 text-sm font-semibold text-white hover:bg-seaglass-800"
          >
            {create.label}
          </Link>
        )}
      </div>
      <div className={`grid gap-3 ${filterColumns}`} role="search">
        {filters}
      </div>
      {query.isPending ? (
        <LoadingState label={loadingLabel} />
      ) : query.isError ? (
        <ErrorState error={query.error} onRetry={() => void query.refetch()} />
      ) : query.data.length === 0 ? (
        <EmptyState title={emptyTitle} />
      ) : (
        children(query.data)
      )}
    </section>
  );
}
