import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const requestPasswordReset = (email: string) => api.post<{ message: string }>('/api/auth/password-reset', { email });

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
