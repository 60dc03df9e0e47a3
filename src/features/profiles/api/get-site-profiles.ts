import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProfileSummary } from '@shared/schemas/profile';
import { api } from '@/lib/api-client';

export const getSiteProfiles = (siteId: string) => api.get<ProfileSummary[]>(`/api/sites/${encodeURIComponent(siteId)}/profiles`);

export const getSiteProfilesQueryOptions = (siteId: string) =>
  queryOptions({ queryKey: ['profiles', 'list', siteId], queryFn: () => getSiteProfiles(siteId) });

export const useSiteProfiles = (siteId: string) => useQuery(getSiteProfilesQueryOptions(siteId));
