import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Site } from '@shared/schemas/site';
import { api } from '@/lib/api-client';

export const getSite = (id: string) => api.get<Site>(`/api/sites/${encodeURIComponent(id)}`);

export const getSiteQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['sites', 'detail', id], queryFn: () => getSite(id) });

/** Waits for an id (pages that learn the site from a battery or profile first). */
export const useSite = (id: string) => useQuery({ ...getSiteQueryOptions(id), enabled: id !== '' });
