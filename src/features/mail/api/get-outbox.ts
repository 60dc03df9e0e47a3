import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailSummary } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';

export const getOutbox = async (to: string) =>
  (await api.get<{ messages: MailSummary[] }>(`/api/mail/outbox${to ? `?to=${encodeURIComponent(to)}` : ''}`)).messages;

export const getOutboxQueryOptions = (to: string) =>
  queryOptions({ queryKey: ['mail', 'list', { to }], queryFn: () => getOutbox(to), refetchInterval: 10_000 });

export const useOutbox = (to: string) => useQuery(getOutboxQueryOptions(to));
