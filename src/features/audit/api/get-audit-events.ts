import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import type { AuditPage } from '@shared/schemas/audit';
import { api } from '@/lib/api-client';

export interface AuditFilterValues {
  action?: string;
  actor?: string;
  entityType?: string;
  from?: string;
  to?: string;
}

export function getAuditEvents(filters: AuditFilterValues, before?: number): Promise<AuditPage> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value) params.set(key, value);
  if (before) params.set('before', String(before));
  params.set('limit', '50');
  return api.get<AuditPage>(`/api/audit?${params.toString()}`);
}

export const getAuditEventsQueryOptions = (filters: AuditFilterValues) =>
  infiniteQueryOptions({
    queryKey: ['audit', 'list', filters],
    queryFn: ({ pageParam }) => getAuditEvents(filters, pageParam),
    initialPageParam: undefined as number | undefined,
    getNextPageParam: (last) => last.nextBefore ?? undefined,
  });

export const useAuditEvents = (filters: AuditFilterValues) => useInfiniteQuery(getAuditEventsQueryOptions(filters));
