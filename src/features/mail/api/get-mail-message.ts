import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailMessage } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';

export const getMailMessage = (id: number) => api.get<MailMessage>(`/api/mail/outbox/${id}`);

export const getMailMessageQueryOptions = (id: number) =>
  queryOptions({ queryKey: ['mail', 'detail', id], queryFn: () => getMailMessage(id), staleTime: Infinity });

export const useMailMessage = (id: number | null) => useQuery({ ...getMailMessageQueryOptions(id ?? 0), enabled: id !== null });
