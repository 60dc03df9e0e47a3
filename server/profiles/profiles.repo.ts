import { and, desc, eq, sql } from 'drizzle-orm';
import type { ProfileKind } from '@shared/profile-csv';
import type { DbOrTx } from '../db/client';
import { users } from '../users/users.schema';
import { profiles } from './profiles.schema';

export type ProfileValues = Omit<typeof profiles.$inferInsert, 'id' | 'uploadedAt'>;

/** Every column but the series and the file: what lists and headers need. */
const summaryColumns = {
  id: profiles.id,
  siteId: profiles.siteId,
  kind: profiles.kind,
  name: profiles.name,
  unit: profiles.unit,
  sourceUnit: profiles.sourceUnit,
  intervalEnding: profiles.intervalEnding,
  startAt: profiles.startAt,
  stepMinutes: profiles.stepMinutes,
  valueCount: profiles.valueCount,
  filledCount: sql<number>`cardinality(${profiles.filledIndexes})`,
  minValue: profiles.minValue,
  maxValue: profiles.maxValue,
  meanValue: profiles.meanValue,
  notes: profiles.notes,
  originalFilename: profiles.originalFilename,
  originalSha256: profiles.originalSha256,
  originalBytes: sql<number>`octet_length(${profiles.originalFile})`,
  uploadedBy: profiles.uploadedBy,
  // The uploader's display name; null once the account is gone (user ids carry no foreign key).
  uploadedByName: sql<string | null>`(select ${users.name} from ${users} where ${users.id} = ${profiles.uploadedBy})`,
  uploadedAt: profiles.uploadedAt,
};

export type ProfileSummaryRow = NonNullable<Awaited<ReturnType<typeof findProfileSummary>>>;

export async function insertProfile(db: DbOrTx, values: ProfileValues): Promise<string> {
  const [row] = await db.insert(profiles).values(values).returning({ id: profiles.id });
  if (!row) throw new Error('insert into profiles returned no row');
  return row.id;
}

export async function listProfiles(db: DbOrTx, siteId: string, kind?: 'price' | 'load' | 'generation') {
  return db
    .select(summaryColumns)
    .from(profiles)
    .where(kind ? and(eq(profiles.siteId, siteId), eq(profiles.kind, kind)) : eq(profiles.siteId, siteId))
    .orderBy(desc(profiles.uploadedAt), desc(profiles.id));
}

export async function findProfileSummary(db: DbOrTx, id: string, lock = false) {
  const query = db.select(summaryColumns).from(profiles).where(eq(profiles.id, id));
  const [row] = await (lock ? query.for('update') : query);
  return row;
}

/**
 * Values[first, end) (0-based, end exclusive) sliced inside PostgreSQL, so a
 * week of a 5-minute year never leaves the database as 105 120 numbers.
 */
export async function findProfileValues(db: DbOrTx, id: string, first: number, end: number) {
  // PostgreSQL arrays are 1-based with inclusive bounds; [a:b] with a > b is empty.
  const [row] = await db
    .select({
      values: sql<number[]>`${profiles.values}[${first + 1}:${end}]`.mapWith(profiles.values),
      filledIndexes: profiles.filledIndexes,
    })
    .from(profiles)
    .where(eq(profiles.id, id));
  return row;
}

/** The site's profile of `kind` uploaded from the file with this SHA-256, if any. */
export async function findSiteProfileBySha256(db: DbOrTx, siteId: string, kind: ProfileKind, sha256: string) {
  const [row] = await db
    .select({ id: profiles.id })
    .from(profiles)
    .where(and(eq(profiles.siteId, siteId), eq(profiles.kind, kind), eq(profiles.originalSha256, sha256)));
  return row;
}

export async function findOriginalFile(db: DbOrTx, id: string) {
  const [row] = await db
    .select({ file: profiles.originalFile, filename: profiles.originalFilename, sha256: profiles.originalSha256 })
    .from(profiles)
    .where(eq(profiles.id, id));
  return row;
}

export async function deleteProfile(db: DbOrTx, id: string): Promise<boolean> {
  const rows = await db.delete(profiles).where(eq(profiles.id, id)).returning({ id: profiles.id });
  return rows.length > 0;
}

export interface UploadIdentity {
  siteId: string;
  kind: 'price' | 'load' | 'generation';
  sha256: string;
  sourceUnit: string;
  intervalEnding: boolean;
  name: string;
}

/**
 * The profile an identical upload already made: the same bytes, read the same way, under
 * the same name, for the same site and kind (a retried push). Takes a transaction-scoped lock on that identity first, so
 * two simultaneous identical uploads store one profile, not two.
 */
export async function findSameUpload(tx: DbOrTx, u: UploadIdentity) {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`profile-upload:${u.siteId}:${u.kind}:${u.sha256}`}))`);
  const [row] = await tx
    .select({ id: profiles.id, filledCount: sql<number>`cardinality(${profiles.filledIndexes})` })
    .from(profiles)
    .where(
      and(
        eq(profiles.siteId, u.siteId),
        eq(profiles.kind, u.kind),
        eq(profiles.originalSha256, u.sha256),
        eq(profiles.sourceUnit, u.sourceUnit),
        eq(profiles.intervalEnding, u.intervalEnding),
        eq(profiles.name, u.name),
      ),
    )
    .orderBy(profiles.uploadedAt)
    .limit(1);
  return row;
}
