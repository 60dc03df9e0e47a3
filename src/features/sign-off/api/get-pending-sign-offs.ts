import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PendingSignOff } from '@shared/schemas/sign-off';
import { api } from '@/lib/api-client';

export const getPendingSignOffs = async () => (await api.get<{ plans: PendingSignOff[] }>('/api/sign-off/pending')).plans;

export const getPendingSignOffsQueryOptions = () =>
  // A new submission should show up without a reload: poll while the list is on screen.
  queryOptions({ queryKey: ['plans', 'sign-off', 'pending'], queryFn: getPendingSignOffs, refetchInterval: 30_000 });

export const usePendingSignOffs = (enabled = true) => useQuery({ ...getPendingSignOffsQueryOptions(), enabled });
