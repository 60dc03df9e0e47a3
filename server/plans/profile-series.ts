/**
 * Reads the values of the profiles a snapshot names, for a job. The snapshot
 * carries each profile's SHA-256; a profile that changed or vanished since
 * the plan was made is a failure no retry can fix.
 */
import type { ProfileRef } from '@shared/schemas/plan';
import type { DbOrTx } from '../db/client';
import { findProfileSummary, findProfileValues } from '../profiles/profiles.repo';
import type { ProfileSeries } from '../engine';
import { JobFailure } from '../jobs/job-types';

export async function loadProfileSeries(db: DbOrTx, ref: ProfileRef): Promise<ProfileSeries> {
  const summary = await findProfileSummary(db, ref.id);
  if (!summary)
    throw new JobFailure(
      `The ${ref.kind} profile "${ref.name}" was deleted after this was queued; create it again with another profile.`,
    );
  if (summary.originalSha256 !== ref.sha256) {
    throw new JobFailure(
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
) {
  return {
    price: await loadProfileSeries(db, profiles.price),
    load: profiles.load ? await loadProfileSeries(db, profiles.load) : null,
    generation: profiles.generation ? await loadProfileSeries(db, profiles.generation) : null,
  };
}
