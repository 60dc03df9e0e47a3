import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invalidatePlans } from './invalidate-plans';

export interface PlanCopy {
  id: string;
  status: 'draft';
  version: number;
  copiedFrom: string;
}

export const copyPlan = (planId: string) => api.post<PlanCopy>(`/api/plans/${encodeURIComponent(planId)}/copy`, {});

export function useCopyPlan() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: copyPlan, onSettled: () => invalidatePlans(queryClient) });
}
