import { useState } from 'react';
import type { AuditEvent } from '@shared/schemas/audit';
import { buttonClass } from '@/components/form-field';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { ScrollRegion } from '@/components/scroll-region';
import { tableClass, theadClass } from '@/components/table-classes';
import { formatMoment } from '@/lib/format';
import { useAuditEvents, type AuditFilterValues } from '../api/get-audit-events';
import { AuditFilters } from './audit-filters';
import { describeDetails } from './audit-words';

/** "plan for Depot battery 1 from …", or the kind and the start of the id when the entity has no name (any more). */
function entityText(event: AuditEvent): string {
  if (!event.entityType) return '—';
  if (event.entityName) return `${event.entityType}: ${event.entityName}`;
  return event.entityId ? `${event.entityType} ${event.entityId.slice(0, 8)}…` : event.entityType;
}

function EventRow({ event, names }: { event: AuditEvent; names: Record<string, string> }) {
  const refused = event.action === 'access.denied' || event.action.endsWith('_failed') || event.action.endsWith('_blocked');
  return (
    <tr className="border-t border-ink-100 align-top">
      <td className="px-4 py-2 whitespace-nowrap tabular-nums" title={formatMoment(event.at, true)}>
        {formatMoment(event.at)}
      </td>
      <td className="px-4 py-2 whitespace-nowrap">{event.actorEmail ?? '—'}</td>
      <td className="px-4 py-2 whitespace-nowrap">
        <span className={`font-mono text-xs ${refused ? 'text-brick-700' : 'text-ink-900'}`}>{event.action}</span>
      </td>
      <td className="min-w-48 px-4 py-2 text-ink-700" title={event.entityId ?? undefined}>
        {entityText(event)}
      </td>
      <td className="min-w-56 px-4 py-2 text-ink-700 [overflow-wrap:anywhere]">{describeDetails(event.details, names) || '—'}</td>
      <td className="px-4 py-2 font-mono text-xs whitespace-nowrap text-ink-500">{event.ip ?? '—'}</td>
    </tr>
  );
}

/** Admin page: the append-only audit trail, newest first. */
export function AuditPage() {
  const [filters, setFilters] = useState<AuditFilterValues>({});
  const query = useAuditEvents(filters);
  const events = query.data?.pages.flatMap((p) => p.events) ?? [];
  const names = Object.assign({}, ...(query.data?.pages.map((p) => p.names) ?? [])) as Record<string, string>;

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
        <ScrollRegion label="Audit entries (scrolls sideways)" className="rounded-lg border border-ink-100 bg-white shadow-sm">
          <table className={tableClass}>
            <caption className="sr-only">Audit entries, newest first</caption>
            <thead className={theadClass}>
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
                <EventRow key={event.id} event={event} names={names} />
              ))}
            </tbody>
          </table>
        </ScrollRegion>
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
