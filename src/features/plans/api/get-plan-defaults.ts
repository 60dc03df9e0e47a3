import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PlanDefaults } from '@shared/schemas/plan';
import { api } from '@/lib/api-client';

export const getPlanDefaults = (batteryId: string, deliveryStart: string | null) =>
  api.get<PlanDefaults>(
    `/api/batteries/${batteryId}/plan-defaults${deliveryStart ? `?deliveryStart=${encodeURIComponent(deliveryStart)}` : ''}`,
  );

export const getPlanDefaultsQueryOptions = (batteryId: string, deliveryStart: string | null) =>
  queryOptions({
    queryKey: ['plans', 'defaults', batteryId, deliveryStart],
    queryFn: () => getPlanDefaults(batteryId, deliveryStart),
  });

export const usePlanDefaults = (batteryId: string | null, deliveryStart: string | null) =>
  useQuery({ ...getPlanDefaultsQueryOptions(batteryId ?? '', deliveryStart), enabled: !!batteryId });
