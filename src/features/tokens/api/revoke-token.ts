import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const revokeToken = (id: string) => api.delete<void>(`/api/tokens/${encodeURIComponent(id)}`);

export function useRevokeToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeToken,
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['tokens'] }),
        queryClient.invalidateQueries({ queryKey: ['service-users'] }),
      ]),
  });
}
