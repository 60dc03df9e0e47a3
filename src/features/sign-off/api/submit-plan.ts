import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignOffAction, SignOffRecord } from '@shared/schemas/sign-off';
import { api } from '@/lib/api-client';
import { invalidatePlans } from './invalidate-plans';

export const submitPlan = ({ planId, ...body }: SignOffAction & { planId: string }) =>
  api.post<SignOffRecord>(`/api/plans/${encodeURIComponent(planId)}/submit`, body);

export function useSubmitPlan() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: submitPlan, onSettled: () => invalidatePlans(queryClient) });
}
