import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignOffRecord } from '@shared/schemas/sign-off';
import { api } from '@/lib/api-client';
import { invalidatePlans } from './invalidate-plans';

export const rejectPlan = ({ planId, ...body }: { planId: string; comment: string; version: number }) =>
  api.post<SignOffRecord>(`/api/plans/${encodeURIComponent(planId)}/reject`, body);

export function useRejectPlan() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: rejectPlan, onSettled: () => invalidatePlans(queryClient) });
}
