/**
 * Accepting a profile upload: the server parses the bytes again with the same
 * reader the browser preview used and is the authority. A rejected file answers
 * 422 with every problem (up to the reader's cap) and stores nothing; an
 * accepted one is stored with its original bytes, SHA-256 and uploader, and its
 * audit row, in one transaction. The same file sent again for the same site and kind,
 * read the same way and under the same name, stores nothing new: the existing profile is
 * the answer, so a pipeline that retries a push makes no duplicates.
 */
import { createHash } from 'node:crypto';
import { decodeProfileBytes, parseProfileCsv } from '@shared/profile-csv';
import { recordAudit } from '../audit/audit.service';
import { getDb } from '../db/client';
import { AppError } from '../http/app-error';
import type { Actor } from '../http/request-context';
import { requireSite } from '../sites/sites.service';
import { parseUploadFields } from './profile-upload-options';
import * as repo from './profiles.repo';

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

const ACCEPTED_EXTENSIONS = ['csv', 'txt'];

/** The file's own name without any client path, control characters or excess length. */
export function safeFilename(original: string): string {
  const base = original.split(/[\\/]/).pop() ?? '';
  const clean = base
    .replace(/[\u0000-\u001f\u007f"]/g, '')
    .trim()
    .slice(-200);
  return clean === '' ? 'profile.csv' : clean;
}

function rejectUpload(message: string, issues: { line: number; message: string }[], hint: string): AppError {
  return new AppError('invalid_profile', message, 422, issues, { hint });
}

function checkExtension(filename: string) {
  const extension = /\.([^.]+)$/.exec(filename)?.[1]?.toLowerCase();
  if (extension === undefined || !ACCEPTED_EXTENSIONS.includes(extension)) {
    const message = `"${filename}" is not a CSV file: only .csv (or .txt) text files are accepted.`;
    throw rejectUpload(
      message,
      [{ line: 0, message }],
      'Nothing was stored. Export the data from your spreadsheet or system as CSV (UTF-8) and upload that file.',
    );
  }
}

function summarise(values: readonly number[]) {
  let min = Infinity;
  let max = -Infinity;
  let sum = 0;
  for (const v of values) {
    if (v < min) min = v;
    if (v > max) max = v;
    sum += v;
  }
  return { minValue: min, maxValue: max, meanValue: sum / values.length };
}

export async function uploadProfile(
  siteId: string,
  file: UploadedFile | undefined,
  fields: unknown,
  actor: Actor,
): Promise<{ id: string; created: boolean }> {
  const site = await requireSite(getDb(), siteId);
  // The unit is read for this site: a price may be given in its currency per MWh or kWh.
  const options = parseUploadFields(fields, site.currency);
  if (!file) {
    const message = 'No file was attached: send the CSV in the form field "file".';
    throw rejectUpload(message, [{ line: 0, message }], 'Nothing was stored. Choose a CSV file and upload again.');
  }
  const filename = safeFilename(file.originalname);
  checkExtension(filename);

  const parsed = parseProfileCsv(decodeProfileBytes(file.buffer), {
    kind: options.kind,
    unit: options.unit,
    timezone: site.timezone,
    currency: site.currency,
    intervalEnding: options.intervalEnding,
    fillGaps: options.fillGaps,
    ...(options.dateOrder ? { dateOrder: options.dateOrder } : {}),
    ...(options.decimalSeparator ? { decimalSeparator: options.decimalSeparator } : {}),
  });
  if (!parsed.ok) {
    const count = parsed.issues.length;
    throw rejectUpload(
      `The file "${filename}" was not accepted: ${count} problem${count === 1 ? '' : 's'} listed by line.`,
      parsed.issues,
      parsed.hint,
    );
  }

  const { profile } = parsed;
  const sha256 = createHash('sha256').update(file.buffer).digest('hex');
  const name = options.name ?? filename.replace(/\.[^.]+$/, '');
  return getDb().transaction(async (tx) => {
    const identity = {
      siteId,
      kind: options.kind,
      sha256,
      sourceUnit: options.unit,
      intervalEnding: options.intervalEnding,
      name,
    };
    const same = await repo.findSameUpload(tx, identity);
    // A profile that needed filled gaps answers only a request that allows filling.
    if (same && (same.filledCount === 0 || options.fillGaps)) {
      await recordAudit(tx, actor, {
        action: 'profile.upload_repeated',
        entityType: 'profile',
        entityId: same.id,
        details: { siteId, kind: options.kind, filename, sha256 },
      });
      return { id: same.id, created: false };
    }
    const id = await repo.insertProfile(tx, {
      siteId,
      kind: options.kind,
      name,
      unit: profile.unit,
      sourceUnit: options.unit,
      intervalEnding: options.intervalEnding,
      startAt: new Date(profile.startMs),
      stepMinutes: profile.stepMinutes,
      valueCount: profile.values.length,
      values: profile.values,
      filledIndexes: profile.filledIndexes,
      ...summarise(profile.values),
      notes: profile.notes,
      originalFile: file.buffer,
      originalFilename: filename,
      originalSha256: sha256,
      uploadedBy: actor.id,
    });
    await recordAudit(tx, actor, {
      action: 'profile.upload',
      entityType: 'profile',
      entityId: id,
      details: {
        siteId,
        kind: options.kind,
        name,
        sourceUnit: options.unit,
        filename,
        sha256,
        bytes: file.buffer.length,
        valueCount: profile.values.length,
        stepMinutes: profile.stepMinutes,
        filledCount: profile.filledIndexes.length,
        ...(options.dateOrder ? { dateOrder: options.dateOrder } : {}),
        ...(options.decimalSeparator ? { decimalSeparator: options.decimalSeparator } : {}),
      },
    });
    return { id, created: true };
  });
}
