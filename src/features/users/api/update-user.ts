import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateUserRequest, User } from '@shared/schemas/users';
import { api } from '@/lib/api-client';

export const updateUser = ({ id, ...patch }: UpdateUserRequest & { id: string }) =>
  api.patch<User>(`/api/users/${encodeURIComponent(id)}`, patch);

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateUser, onSettled: () => queryClient.invalidateQueries({ queryKey: ['users'] }) });
}
