import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { HorizonPreview } from '@shared/schemas/horizon-preview';
import { ApiError, api } from '@/lib/api-client';

/** `POST /api/plans/:id/horizon-preview`: the plan re-solved with another horizon; changes nothing. */
export const previewHorizon = (planId: string, horizonHours: number) =>
  api.post<HorizonPreview>(`/api/plans/${planId}/horizon-preview`, { horizonHours });

export const horizonPreviewQueryOptions = (planId: string, horizonHours: number) =>
  queryOptions({
    queryKey: ['plans', 'horizon-preview', planId, horizonHours],
    queryFn: () => previewHorizon(planId, horizonHours),
    // A plan's inputs never change, so neither does its preview for one horizon.
    staleTime: Infinity,
    // A refusal (422, 429) says what to do; asking again at once would not change it.
    retry: (failures, error) => failures < 1 && !(error instanceof ApiError && error.status >= 400 && error.status < 500),
  });

/** Keeps the previous preview on screen while the next loads, so the chart does not flash. */
export const useHorizonPreview = (planId: string, horizonHours: number | null) =>
  useQuery({
    ...horizonPreviewQueryOptions(planId, horizonHours ?? 0),
    enabled: horizonHours !== null,
    placeholderData: keepPreviousData,
  });

/** True for the answer that the plan's model needs the LP path, so no preview can be made for it. */
export const isPreviewUnavailable = (error: unknown): error is ApiError =>
  error instanceof ApiError && error.status === 422 && error.body.previewAvailable === false;
