import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AuthUser } from '@shared/schemas/auth';
import { api, ApiError } from '@/lib/api-client';
import { meQueryKey } from '@/lib/authorization';

/** The signed-in user, or null when nobody is signed in (401). */
export async function getMe(): Promise<AuthUser | null> {
  try {
    return await api.get<AuthUser>('/api/auth/me');
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const getMeQueryOptions = () => queryOptions({ queryKey: meQueryKey, queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(getMeQueryOptions());
