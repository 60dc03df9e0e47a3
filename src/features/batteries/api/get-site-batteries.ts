import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Battery } from '@shared/schemas/battery';
import { api } from '@/lib/api-client';

export const getSiteBatteries = (siteId: string) => api.get<Battery[]>(`/api/sites/${encodeURIComponent(siteId)}/batteries`);

export const getSiteBatteriesQueryOptions = (siteId: string) =>
  queryOptions({ queryKey: ['batteries', 'list', siteId], queryFn: () => getSiteBatteries(siteId) });

export const useSiteBatteries = (siteId: string) => useQuery(getSiteBatteriesQueryOptions(siteId));
