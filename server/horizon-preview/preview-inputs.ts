/**
 * The profile values a plan's snapshot names, read for the preview thread the
 * first time it meets the snapshot (the thread keeps them aligned afterwards).
 * The database stays in the web process: the thread only computes.
 */
import type { PlanInputs } from '@shared/schemas/plan';
import { getDb } from '../db/client';
import { AppError } from '../http/app-error';
import { loadSnapshotProfiles, SnapshotProfileError, type SnapshotSeries } from '../runs/profile-series';

/** Loads shared by concurrent previews of the same snapshot, so a burst of slider moves reads once. */
const loading = new Map<string, Promise<SnapshotSeries>>();

export function loadPreviewSeries(key: string, inputs: PlanInputs): Promise<SnapshotSeries> {
  let entry = loading.get(key);
  if (!entry) {
    entry = read(inputs).finally(() => loading.delete(key));
    loading.set(key, entry);
  }
  return entry;
}

async function read(inputs: PlanInputs): Promise<SnapshotSeries> {
  try {
    return await loadSnapshotProfiles(getDb(), inputs.profiles);
  } catch (error) {
    // The job's wording ("after this was queued") fits here too: the plan rests on a profile that is gone.
    if (error instanceof SnapshotProfileError)
      throw new AppError('conflict', `The plan cannot be previewed: ${error.message}`, 409);
    throw error;
  }
}
