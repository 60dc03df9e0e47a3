/**
 * The site's load and generation over a plan's steps, read from the plan's own profiles
 * (`GET /api/profiles/:id?from&to`): the plan's results hold the grid exchange and the
 * battery, the profiles hold what the site itself draws and makes. Values are kW, one per
 * plan step (the profile value of the interval the step starts in), null where none.
 */
import { useQuery } from '@tanstack/react-query';
import type { Plan } from '@shared/schemas/plan';
import type { ProfileDetail } from '@shared/schemas/profile';
import { api } from '@/lib/api-client';

function getProfileWindow(id: string, from: string, to: string) {
  const query = new URLSearchParams({ from, to }).toString();
  return api.get<ProfileDetail>(`/api/profiles/${encodeURIComponent(id)}?${query}`);
}

/** One value per step start, from a profile window (its own step may be longer than the plan's). */
export function alignToSteps(profile: ProfileDetail, stepStarts: readonly number[]): (number | null)[] {
  const first = Date.parse(profile.window.start);
  const stepMs = profile.stepMinutes * 60_000;
  return stepStarts.map((t) => {
    const i = Math.floor((t - first) / stepMs);
    return i >= 0 && i < profile.values.length ? (profile.values[i] ?? null) : null;
  });
}

function useProfileWindow(id: string | null, from: string, to: string) {
  return useQuery({
    // The profiles feature keys its windows the same way, so both share the cache.
    queryKey: ['profiles', 'detail', id, { from, to }],
    queryFn: () => getProfileWindow(id!, from, to),
    enabled: id !== null && from !== '',
    // A stored profile never changes (only deletion).
    staleTime: Infinity,
  });
}

export interface SiteFlows {
  load: (number | null)[] | null;
  generation: (number | null)[] | null;
  pending: boolean;
}

export function useSiteFlows(plan: Plan): SiteFlows {
  const steps = plan.results?.steps ?? [];
  const stepMs = (plan.results?.stepMinutes ?? 60) * 60_000;
  const starts = steps.map((s) => Date.parse(s.time));
  const from = starts.length > 0 ? new Date(starts[0]!).toISOString() : '';
  const to = starts.length > 0 ? new Date(starts.at(-1)! + stepMs).toISOString() : '';
  const load = useProfileWindow(plan.loadProfileId, from, to);
  const generation = useProfileWindow(plan.generationProfileId, from, to);
  return {
    load: load.data ? alignToSteps(load.data, starts) : null,
    generation: generation.data ? alignToSteps(generation.data, starts) : null,
    pending: (plan.loadProfileId !== null && load.isPending) || (plan.generationProfileId !== null && generation.isPending),
  };
}
