/**
 * Reads the values of the profiles a snapshot names, for a job or the horizon
 * preview. The snapshot carries each profile's SHA-256; a profile that changed
 * or vanished since the run was made is a failure no retry can fix.
 */
import type { ProfileRef } from '@shared/schemas/plan';
import type { DbOrTx } from '../db/client';
import { findProfileSummary, findProfileValues } from '../profiles/profiles.repo';
import type { ProfileSeries } from '../engine';

/** A profile the snapshot names is gone or changed: the run cannot be computed as it was made. */
export class SnapshotProfileError extends Error {
  override name = 'SnapshotProfileError';
}

/** The profile values a run is computed on, on their own grids (the thread aligns them). */
export interface SnapshotSeries {
  readonly price: ProfileSeries;
  readonly load: ProfileSeries | null;
  readonly generation: ProfileSeries | null;
}

async function loadProfileSeries(db: DbOrTx, ref: ProfileRef): Promise<ProfileSeries> {
  const summary = await findProfileSummary(db, ref.id);
  if (!summary)
    throw new SnapshotProfileError(
      `The ${ref.kind} profile "${ref.name}" was deleted after this was queued; create it again with another profile.`,
    );
  if (summary.originalSha256 !== ref.sha256) {
    throw new SnapshotProfileError(
      `The ${ref.kind} profile "${ref.name}" changed after this was queued (its SHA-256 differs); create it again.`,
    );
  }
  const values = await findProfileValues(db, ref.id, 0, summary.valueCount);
  if (!values || values.values.length !== summary.valueCount) throw new Error(`profile ${ref.id} returned no values`);
  return { startMs: summary.startAt.getTime(), stepMinutes: summary.stepMinutes, values: values.values };
}

export async function loadSnapshotProfiles(
  db: DbOrTx,
  profiles: { price: ProfileRef; load: ProfileRef | null; generation: ProfileRef | null },
): Promise<SnapshotSeries> {
  return {
    price: await loadProfileSeries(db, profiles.price),
    load: profiles.load ? await loadProfileSeries(db, profiles.load) : null,
    generation: profiles.generation ? await loadProfileSeries(db, profiles.generation) : null,
  };
}
