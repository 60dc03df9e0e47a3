import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Site } from '@shared/schemas/site';
import { api } from '@/lib/api-client';

export const getSites = () => api.get<Site[]>('/api/sites');

export const getSitesQueryOptions = () => queryOptions({ queryKey: ['sites', 'list'], queryFn: getSites });

export const useSites = () => useQuery(getSitesQueryOptions());
