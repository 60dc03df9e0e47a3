import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AuthUser, SignInRequest } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { meQueryKey } from '@/lib/authorization';

export const signIn = (body: SignInRequest) => api.post<AuthUser>('/api/auth/sign-in', { ...body });

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => {
      // Data cached for another user must not be shown to this one.
      queryClient.clear();
      queryClient.setQueryData(meQueryKey, user);
    },
  });
}
