/** Reading and deleting profiles; uploads live in profile-upload.service.ts. */
import type { ProfileDetail, ProfileSummary, ProfileWindowQuery } from '@shared/schemas/profile';
import type { ProfileKind } from '@shared/profile-csv';
import { recordAudit } from '../audit/audit.service';
import { getDb } from '../db/client';
import { AppError, conflict, notFound, unprocessable } from '../http/app-error';
import { FOREIGN_KEY_VIOLATION, pgErrorCode } from '../db/pg-errors';
import type { Actor } from '../http/request-context';
import { requireSite } from '../sites/sites.service';
import { findPlansProtectingProfile } from '../plans/plans.repo';
import * as repo from './profiles.repo';

const MINUTE_MS = 60_000;

function toSummary(row: repo.ProfileSummaryRow): ProfileSummary {
  const startMs = row.startAt.getTime();
  return {
    id: row.id,
    siteId: row.siteId,
    kind: row.kind,
    name: row.name,
    unit: row.unit,
    sourceUnit: row.sourceUnit,
    intervalEnding: row.intervalEnding,
    start: row.startAt.toISOString(),
    end: new Date(startMs + row.valueCount * row.stepMinutes * MINUTE_MS).toISOString(),
    stepMinutes: row.stepMinutes,
    valueCount: row.valueCount,
    filledCount: row.filledCount,
    min: row.minValue,
    max: row.maxValue,
    mean: row.meanValue,
    notes: row.notes,
    originalFilename: row.originalFilename,
    originalSha256: row.originalSha256,
    originalBytes: row.originalBytes,
    uploadedBy: row.uploadedBy,
    uploadedByName: row.uploadedByName,
    uploadedAt: row.uploadedAt.toISOString(),
  };
}

async function requireSummary(id: string, lock = false, db = getDb()): Promise<repo.ProfileSummaryRow> {
  const row = await repo.findProfileSummary(db, id, lock);
  if (!row) throw notFound(`The profile ${id}`);
  return row;
}

export async function listSiteProfiles(siteId: string, kind?: ProfileKind): Promise<ProfileSummary[]> {
  const db = getDb();
  await requireSite(db, siteId);
  return (await repo.listProfiles(db, siteId, kind)).map(toSummary);
}

export async function getProfileSummary(id: string): Promise<ProfileSummary> {
  return toSummary(await requireSummary(id));
}

/** Index range [first, end) of the intervals that start in [from, to). */
export function windowIndexes(startMs: number, stepMinutes: number, count: number, query: ProfileWindowQuery) {
  const stepMs = stepMinutes * MINUTE_MS;
  const indexAtOrAfter = (iso: string | undefined, fallback: number) =>
    iso === undefined ? fallback : Math.min(count, Math.max(0, Math.ceil((Date.parse(iso) - startMs) / stepMs)));
  const first = indexAtOrAfter(query.from, 0);
  const end = Math.max(first, indexAtOrAfter(query.to, count));
  return { first, end };
}

export async function getProfile(id: string, query: ProfileWindowQuery): Promise<ProfileDetail> {
  const db = getDb();
  const summary = toSummary(await requireSummary(id, false, db));
  const { first, end } = windowIndexes(Date.parse(summary.start), summary.stepMinutes, summary.valueCount, query);
  const series = await repo.findProfileValues(db, id, first, end);
  if (!series) throw notFound(`The profile ${id}`);
  return {
    ...summary,
    window: {
      offset: first,
      start: new Date(Date.parse(summary.start) + first * summary.stepMinutes * MINUTE_MS).toISOString(),
      count: series.values.length,
    },
    values: series.values,
    filledIndexes: series.filledIndexes,
  };
}

export async function getOriginalFile(id: string) {
  const file = await repo.findOriginalFile(getDb(), id);
  if (!file) throw notFound(`The profile ${id}`);
  return file;
}

/**
 * A profile of `siteId` (and of `kind`, when given), for modules that take
 * profile ids from a request: a profile of another site is refused, never used.
 */
export async function requireSiteProfile(siteId: string, profileId: string, kind?: ProfileKind): Promise<ProfileSummary> {
  const row = await repo.findProfileSummary(getDb(), profileId);
  if (!row) throw notFound(`The profile ${profileId}`);
  if (row.siteId !== siteId)
    throw unprocessable(`The profile "${row.name}" belongs to another site; choose a profile uploaded for this site.`);
  if (kind && row.kind !== kind)
    throw unprocessable(`The profile "${row.name}" is a ${row.kind} profile; choose a ${kind} profile.`);
  return toSummary(row);
}

export async function deleteProfile(id: string, actor: Actor): Promise<void> {
  try {
    await getDb().transaction(async (tx) => {
      // The row lock keeps two deletes (or a delete and a check) from interleaving.
      const row = await requireSummary(id, true, tx);
      // Submitted and approved plans must stay checkable against the data they were solved on.
      const plans = await findPlansProtectingProfile(tx, id);
      if (plans.length > 0) {
        const list = plans.map((p) => `${p.id} (${p.status})`).join(', ');
        throw new AppError(
          'profile_in_use',
          `The profile "${row.name}" cannot be deleted: ${plans.length === 1 ? 'a plan that is' : 'plans that are'} submitted or approved rest${plans.length === 1 ? 's' : ''} on it (${list}). A signed plan must stay checkable against its inputs.`,
          409,
          undefined,
          { plans },
        );
      }
      await repo.deleteProfile(tx, id);
      await recordAudit(tx, actor, {
        action: 'profile.delete',
        entityType: 'profile',
        entityId: id,
        details: {
          siteId: row.siteId,
          kind: row.kind,
          name: row.name,
          sha256: row.originalSha256,
          filename: row.originalFilename,
        },
      });
    });
  } catch (error) {
    // A plan in another status that references the profile by foreign key.
    if (pgErrorCode(error) === FOREIGN_KEY_VIOLATION) {
      throw conflict('The profile cannot be deleted while a plan refers to it. Delete or re-plan that plan first.');
    }
    throw error;
  }
}
