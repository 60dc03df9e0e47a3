import { useState } from 'react';
import type { AuditEvent } from '@shared/schemas/audit';
import { buttonClass } from '@/components/form-field';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { useAuditEvents, type AuditFilterValues } from '../api/get-audit-events';
import { AuditFilters } from './audit-filters';
import { formatMoment } from '@/lib/format';

const describeDetails = (details: Record<string, unknown>) =>
  Object.entries(details)
    .map(([k, v]) => `${k}: ${typeof v === 'string' ? v : JSON.stringify(v)}`)
    .join(' · ');

function EventRow({ event }: { event: AuditEvent }) {
  const refused = event.action === 'access.denied' || event.action.endsWith('_failed') || event.action.endsWith('_blocked');
  return (
    <tr className="border-t border-ink-100 align-top">
      <td className="px-4 py-2 whitespace-nowrap tabular-nums" title={event.at}>
        {formatMoment(event.at, true)}
      </td>
      <td className="px-4 py-2 break-all">{event.actorEmail ?? '—'}</td>
      <td className="px-4 py-2">
        <span className={`font-mono text-xs ${refused ? 'text-brick-700' : 'text-ink-900'}`}>{event.action}</span>
      </td>
      <td className="px-4 py-2 text-ink-700">{event.entityType ? `${event.entityType} ${event.entityId ?? ''}` : '—'}</td>
      <td className="px-4 py-2 text-ink-700">{describeDetails(event.details) || '—'}</td>
      <td className="px-4 py-2 font-mono text-xs text-ink-500">{event.ip ?? '—'}</td>
    </tr>
  );
}

/** Admin page: the append-only audit trail, newest first. */
export function AuditPage() {
  const [filters, setFilters] = useState<AuditFilterValues>({});
  const query = useAuditEvents(filters);
  const events = query.data?.pages.flatMap((p) => p.events) ?? [];

  return (
    <section className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-ink-900">Audit trail</h1>
        <p className="mt-1 text-ink-700">
          Who did what and when, from where. Entries are never changed or removed. Times are shown in your time zone.
        </p>
      </div>
      <AuditFilters onApply={setFilters} />
      {query.isPending && <LoadingState label="Loading the audit trail…" />}
      {query.isError && <ErrorState error={query.error} onRetry={() => void query.refetch()} />}
      {query.isSuccess && events.length === 0 && <EmptyState title="No audit entries match these filters." />}
      {events.length > 0 && (
        <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Audit entries, newest first</caption>
            <thead className="bg-ink-50 text-ink-700">
              <tr>
                {['When', 'Who', 'Action', 'On', 'Details', 'From'].map((h) => (
                  <th key={h} scope="col" className="px-4 py-2 font-semibold">
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {events.map((event) => (
                <EventRow key={event.id} event={event} />
              ))}
            </tbody>
          </table>
        </div>
      )}
      {query.hasNextPage && (
        <button
          type="button"
          onClick={() => void query.fetchNextPage()}
          disabled={query.isFetchingNextPage}
          className={buttonClass.secondary}
        >
          {query.isFetchingNextPage ? 'Loading…' : 'Show older entries'}
        </button>
      )}
    </section>
  );
}
