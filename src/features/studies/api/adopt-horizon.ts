import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Site } from '@shared/schemas/site';
import { api } from '@/lib/api-client';

/** Makes a horizon the site's default for new plans (PATCH /api/sites/:id). */
export const adoptHorizon = ({ siteId, hours }: { siteId: string; hours: number }) =>
  api.patch<Site>(`/api/sites/${siteId}`, { defaultHorizonHours: hours });

export function useAdoptHorizon() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: adoptHorizon,
    // The plan form proposes the default through the plan defaults, cached per battery and window.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['sites'] }),
        queryClient.invalidateQueries({ queryKey: ['plans', 'defaults'] }),
      ]),
  });
}
