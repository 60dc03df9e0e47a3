import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Plan, PlanStatusName } from '@shared/schemas/plan';
import type { JobState } from '@shared/schemas/job';
import { api } from '@/lib/api-client';
import { isJobActive } from '@/components/job-progress';

export interface PlanFilters {
  siteId?: string | undefined;
  batteryId?: string | undefined;
  status?: PlanStatusName | undefined;
  jobState?: JobState | 'active' | undefined;
  deliveryStart?: string | undefined;
  deliveryEnd?: string | undefined;
  flagged?: 'true' | undefined;
  limit?: number | undefined;
}

export function getPlans(filters: PlanFilters) {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value !== undefined && value !== '') params.set(key, String(value));
  return api.get<Plan[]>(`/api/plans?${params.toString()}`);
}

/** Lists poll every 2 s while one of their plans is still being computed. */
export const getPlansQueryOptions = (filters: PlanFilters) =>
  queryOptions({
    queryKey: ['plans', 'list', filters],
    queryFn: () => getPlans(filters),
    refetchInterval: (query) => (query.state.data?.some((p) => isJobActive(p.job)) ? 2000 : false),
  });

export const usePlans = (filters: PlanFilters) => useQuery(getPlansQueryOptions(filters));
