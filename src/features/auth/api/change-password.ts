import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const changePassword = (body: { currentPassword: string; newPassword: string }) =>
  api.post<void>('/api/auth/password', body);

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
