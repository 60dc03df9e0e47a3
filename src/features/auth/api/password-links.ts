import { useMutation, useQuery } from '@tanstack/react-query';
import type { PasswordLinkInfo } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

/** `POST /api/auth/password-links/check`: whom a link belongs to, or why it no longer works. */
export const checkPasswordLink = (token: string) => api.post<PasswordLinkInfo>('/api/auth/password-links/check', { token });

export const usePasswordLink = (token: string | null) =>
  useQuery({
    queryKey: ['auth', 'password-link', token],
    queryFn: () => checkPasswordLink(token ?? ''),
    enabled: !!token,
    retry: false,
    staleTime: Infinity,
  });

/** `POST /api/auth/password-links/redeem`: sets the password; the link then stops working. */
export const redeemPasswordLink = (body: { token: string; password: string }) =>
  api.post<void>('/api/auth/password-links/redeem', body);

export const useRedeemPasswordLink = () => useMutation({ mutationFn: redeemPasswordLink });
