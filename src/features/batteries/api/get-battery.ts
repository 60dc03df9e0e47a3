import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Battery } from '@shared/schemas/battery';
import { api } from '@/lib/api-client';

export const getBattery = (id: string) => api.get<Battery>(`/api/batteries/${encodeURIComponent(id)}`);

export const getBatteryQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['batteries', 'detail', id], queryFn: () => getBattery(id) });

export const useBattery = (id: string) => useQuery(getBatteryQueryOptions(id));
