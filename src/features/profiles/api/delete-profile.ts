import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** 409 with the reason (and the plans) when a submitted or approved plan rests on the profile. */
export const deleteProfile = ({ id }: { id: string; siteId: string }) =>
  api.delete<void>(`/api/profiles/${encodeURIComponent(id)}`);

export function useDeleteProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteProfile,
    onSuccess: (_data, { id, siteId }) => {
      queryClient.removeQueries({ queryKey: ['profiles', 'detail', id] });
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: ['profiles', 'list', siteId] }),
        queryClient.invalidateQueries({ queryKey: ['sites'] }),
      ]);
    },
  });
}
