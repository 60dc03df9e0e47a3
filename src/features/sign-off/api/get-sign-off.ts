import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SignOffRecord } from '@shared/schemas/sign-off';
import { api } from '@/lib/api-client';

export const getSignOff = (planId: string) => api.get<SignOffRecord>(`/api/plans/${encodeURIComponent(planId)}/sign-off`);

export const getSignOffQueryOptions = (planId: string) =>
  queryOptions({
    queryKey: ['plans', 'sign-off', planId],
    queryFn: () => getSignOff(planId),
    // While a plan awaits sign-off someone else decides it: a page left open shows the decision.
    refetchInterval: (query) => (query.state.data?.status === 'submitted' ? 5_000 : false),
  });

export const useSignOff = (planId: string) => useQuery(getSignOffQueryOptions(planId));
