import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlanCreateInput, PlanCreated } from '@shared/schemas/plan';
import { api } from '@/lib/api-client';

export const createPlan = (body: PlanCreateInput) => api.post<PlanCreated>('/api/plans', { ...body });

export function useCreatePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPlan,
    onSuccess: async (created) => {
      queryClient.setQueryData(['plans', 'detail', created.plan.id], created.plan);
      await queryClient.invalidateQueries({ queryKey: ['plans', 'list'] });
      await queryClient.invalidateQueries({ queryKey: ['jobs'] });
    },
  });
}
