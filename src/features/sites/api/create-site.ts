import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Site, SiteCreateInput } from '@shared/schemas/site';
import { api } from '@/lib/api-client';

export const createSite = (input: SiteCreateInput) => api.post<Site>('/api/sites', { ...input });

export function useCreateSite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSite,
    onSuccess: (site) => {
      queryClient.setQueryData(['sites', 'detail', site.id], site);
      return queryClient.invalidateQueries({ queryKey: ['sites', 'list'] });
    },
  });
}
