import { useMutation } from '@tanstack/react-query';
import type { InviteResult } from '@shared/schemas/users';
import { api } from '@/lib/api-client';

export const resendInvitation = (id: string) => api.post<InviteResult>(`/api/users/${encodeURIComponent(id)}/invitations`);

export const useResendInvitation = () => useMutation({ mutationFn: resendInvitation });
