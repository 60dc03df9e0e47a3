import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StudyCreateInput, StudyCreated } from '@shared/schemas/study';
import { api } from '@/lib/api-client';

export const createStudy = (body: StudyCreateInput) => api.post<StudyCreated>('/api/studies', { ...body });

export function useCreateStudy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createStudy,
    onSuccess: async (created) => {
      queryClient.setQueryData(['studies', 'detail', created.study.id], created.study);
      await queryClient.invalidateQueries({ queryKey: ['studies', 'list'] });
      await queryClient.invalidateQueries({ queryKey: ['jobs'] });
    },
  });
}
