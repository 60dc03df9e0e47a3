import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignOffAction, SignOffRecord } from '@shared/schemas/sign-off';
import { api } from '@/lib/api-client';
import { invalidatePlans } from './invalidate-plans';

export const approvePlan = ({ planId, ...body }: SignOffAction & { planId: string }) =>
  api.post<SignOffRecord & { supersededPlanIds: string[] }>(`/api/plans/${encodeURIComponent(planId)}/approve`, body);

export function useApprovePlan() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: approvePlan, onSettled: () => invalidatePlans(queryClient) });
}
