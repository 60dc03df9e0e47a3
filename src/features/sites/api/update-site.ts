import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Site, SitePatch } from '@shared/schemas/site';
import { api } from '@/lib/api-client';

export const updateSite = ({ id, patch }: { id: string; patch: SitePatch }) =>
  api.patch<Site>(`/api/sites/${encodeURIComponent(id)}`, { ...patch });

export function useUpdateSite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSite,
    onSuccess: (site) => {
      queryClient.setQueryData(['sites', 'detail', site.id], site);
      // Battery warnings depend on the site's limits; the plan form's proposed horizon on its default.
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: ['sites', 'list'] }),
        queryClient.invalidateQueries({ queryKey: ['batteries'] }),
        queryClient.invalidateQueries({ queryKey: ['plans', 'defaults'] }),
      ]);
    },
  });
}
