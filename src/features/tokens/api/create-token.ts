import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreatedToken, TokenCreateInput } from '@shared/schemas/tokens';
import { api } from '@/lib/api-client';

/** `serviceUserId`: an admin creating a token for a service user instead of for themselves. */
export const createToken = ({ serviceUserId, ...body }: TokenCreateInput & { serviceUserId?: string }) =>
  api.post<CreatedToken>(serviceUserId ? `/api/service-users/${encodeURIComponent(serviceUserId)}/tokens` : '/api/tokens', {
    ...body,
  });

export function useCreateToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createToken,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['tokens'] }),
        queryClient.invalidateQueries({ queryKey: ['service-users'] }),
      ]),
  });
}
