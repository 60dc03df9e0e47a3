import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProfileDetail, ProfileWindowQuery } from '@shared/schemas/profile';
import { api } from '@/lib/api-client';

/** The profile with the values of [from, to), or all of them when no window is given. */
export function getProfile(id: string, window: ProfileWindowQuery = {}) {
  const query = new URLSearchParams(Object.entries(window).filter((e): e is [string, string] => typeof e[1] === 'string'));
  const text = query.toString();
  const suffix = text === '' ? '' : `?${text}`;
  return api.get<ProfileDetail>(`/api/profiles/${encodeURIComponent(id)}${suffix}`);
}

export const getProfileQueryOptions = (id: string, window: ProfileWindowQuery = {}) =>
  queryOptions({
    queryKey: ['profiles', 'detail', id, window],
    queryFn: () => getProfile(id, window),
    // A stored profile never changes (only deletion): keep it while the tab lives.
    staleTime: Infinity,
  });

export const useProfile = (id: string, window: ProfileWindowQuery = {}) => useQuery(getProfileQueryOptions(id, window));

/** Where the browser downloads the file as it was uploaded. */
export const profileOriginalUrl = (id: string) => `/api/profiles/${encodeURIComponent(id)}/original`;
