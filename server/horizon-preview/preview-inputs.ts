/**
 * A plan's profiles on the engine's grid, and its steady cycle, kept for the
 * next slider move. A plan's snapshot never changes for one input version and
 * its profiles are named by SHA-256, so an entry never goes stale; it only
 * takes memory, hence a small least-recently-used cache. Reading and aligning
 * a year of profiles and solving the steady cycle take far longer than the
 * exact re-plan itself (tenths of a second against milliseconds).
 */
import type { PlanInputs } from '@shared/schemas/plan';
import { solveSteadyCycle, type AlignedInputs, type SteadyCycle } from '../engine';
import { getDb } from '../db/client';
import { AppError, unprocessable } from '../http/app-error';
import { JobFailure } from '../jobs/job-types';
import { alignSnapshot } from '../plans/plan-compute';
import { loadSnapshotProfiles } from '../plans/profile-series';

export interface PreviewSource {
  readonly aligned: AlignedInputs;
  /** Solved on first use (a model the preview refuses never needs it). */
  steady: SteadyCycle | null;
}

/** Entries kept: a year of 5-minute steps is a few MB. */
const MAX_ENTRIES = 8;
const cache = new Map<string, Promise<PreviewSource>>();

async function load(inputs: PlanInputs): Promise<PreviewSource> {
  let series;
  try {
    series = await loadSnapshotProfiles(getDb(), inputs.profiles);
  } catch (error) {
    // The job's wording ("after this was queued") fits here too: the plan rests on a profile that is gone.
    if (error instanceof JobFailure) throw new AppError('conflict', `The plan cannot be previewed: ${error.message}`, 409);
    throw error;
  }
  const aligned = alignSnapshot(inputs, series);
  if (!aligned.ok) throw unprocessable(`The plan’s inputs cannot be put on one time grid: ${aligned.issue.message}.`);
  return { aligned: aligned.inputs, steady: null };
}

/** The aligned profiles of a plan's snapshot, from the cache when there. */
export async function previewSource(planId: string, inputVersion: number, inputs: PlanInputs): Promise<PreviewSource> {
  const key = `${planId}:${inputVersion}`;
  let entry = cache.get(key);
  if (entry) {
    cache.delete(key);
  } else {
    entry = load(inputs);
    // A failed load is not kept: the next request tries again.
    void entry.catch(() => cache.delete(key));
  }
  cache.set(key, entry);
  while (cache.size > MAX_ENTRIES) cache.delete(cache.keys().next().value!);
  return entry;
}

/** The steady cycle of the plan's whole data period, as the plan job solves it. */
export function steadyOf(source: PreviewSource): SteadyCycle {
  if (!source.steady) {
    const result = solveSteadyCycle(source.aligned);
    if (!result.ok) throw unprocessable(`The steady cycle cannot be solved for this plan: ${result.issue.message}.`);
    source.steady = result.cycle;
  }
  return source.steady;
}

