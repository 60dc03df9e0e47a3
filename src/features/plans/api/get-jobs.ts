import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JobListItem } from '@shared/schemas/job';
import { api } from '@/lib/api-client';

export const getJobs = (state: 'active' | 'failed', limit = 20) =>
  api.get<JobListItem[]>(`/api/jobs?state=${state}&limit=${limit}`);

/** Background jobs (plans and studies); the running list polls every 2 s. */
export const getJobsQueryOptions = (state: 'active' | 'failed') =>
  queryOptions({
    queryKey: ['jobs', state],
    queryFn: () => getJobs(state),
    refetchInterval: state === 'active' ? 2000 : 15_000,
  });

export const useJobs = (state: 'active' | 'failed') => useQuery(getJobsQueryOptions(state));
