import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Plan } from '@shared/schemas/plan';
import { api } from '@/lib/api-client';
import { isJobActive } from '@/components/job-progress';

export const getPlan = (id: string) => api.get<Plan>(`/api/plans/${id}`);

/** Polls once a second while the plan's job runs, then stops. */
export const getPlanQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['plans', 'detail', id],
    queryFn: () => getPlan(id),
    refetchInterval: (query) => (isJobActive(query.state.data?.job) ? 1000 : false),
  });

export const usePlan = (id: string) => useQuery(getPlanQueryOptions(id));
