import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Study } from '@shared/schemas/study';
import type { JobState } from '@shared/schemas/job';
import { api } from '@/lib/api-client';
import { isJobActive } from '@/components/job-progress';

export interface StudyFilters {
  siteId?: string | undefined;
  status?: JobState | 'active' | undefined;
}

export function getStudies(filters: StudyFilters) {
  const params = new URLSearchParams({ limit: '100' });
  if (filters.siteId) params.set('siteId', filters.siteId);
  if (filters.status) params.set('status', filters.status);
  return api.get<Study[]>(`/api/studies?${params.toString()}`);
}

export const getStudiesQueryOptions = (filters: StudyFilters) =>
  queryOptions({
    queryKey: ['studies', 'list', filters],
    queryFn: () => getStudies(filters),
    refetchInterval: (query) => (query.state.data?.some((s) => isJobActive(s.job)) ? 2000 : false),
  });

export const useStudies = (filters: StudyFilters) => useQuery(getStudiesQueryOptions(filters));
