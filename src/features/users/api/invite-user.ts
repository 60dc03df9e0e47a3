import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InviteResult, InviteUserRequest } from '@shared/schemas/users';
import { api } from '@/lib/api-client';

export const inviteUser = (body: InviteUserRequest) => api.post<InviteResult>('/api/users', { ...body });

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: inviteUser, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['users'] }) });
}
