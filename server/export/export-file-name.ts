/**
 * The export's file name: site, delivery window (its local start with offset and
 * its length), the start of the plan id and the status, so a file lying in a
 * shared folder still says what it is. Under 100 characters, which every file
 * system, archive tool and e-mail client keeps whole; the full plan id and the
 * checksum are in the file's first row and in the response headers. ASCII only,
 * no characters that file systems or the Content-Disposition header (RFC 6266)
 * treat specially.
 */
import { createZoneClock, formatInstant } from '@shared/profile-csv';
import type { PlanStatus } from '@shared/schemas/sign-off';

export interface FileNameParts {
  readonly siteName: string;
  readonly timezone: string;
  readonly startMs: number;
  readonly endMs: number;
  readonly planId: string;
  readonly status: PlanStatus;
  /** Not part of the name (kept in the header and the file); accepted so callers pass what they have. */
  readonly checksum?: string | null;
}

/** The longest name this makes (a 20-character site, a year-long window, the longest status). */
export const MAX_FILE_NAME_LENGTH = 99;

/** Lower-case ASCII words joined by hyphens; accents dropped, anything else becomes a separator. */
export function slug(text: string, max = 40): string {
  const ascii = text.normalize('NFKD').replace(/[\u0300-\u036f]/g, '');
  const words = ascii
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  let cut = words.slice(0, max);
  // Cut at a word's end when the name is longer, rather than inside a word.
  if (words.length > max && words[max] !== '-' && cut.lastIndexOf('-') >= max / 2) cut = cut.slice(0, cut.lastIndexOf('-'));
  return cut.replace(/-+$/, '') || 'site';
}

/** 2026-03-29T03:00:00+02:00 becomes 2026-03-29T0300+0200 (no colons: not allowed in Windows file names). */
function compactInstant(ms: number, timezone: string): string {
  const clock = createZoneClock(timezone);
  const text = clock ? formatInstant(ms, clock) : new Date(ms).toISOString().slice(0, 19) + '+00:00';
  return text.replace(/:\d\d(?=[+-]\d\d:\d\d$)/, '').replace(/:/g, '');
}

const STATUS_PART: Readonly<Record<PlanStatus, string>> = {
  approved: 'approved',
  superseded: 'superseded-not-current',
  draft: 'draft-NOT-APPROVED',
  submitted: 'submitted-NOT-APPROVED',
  rejected: 'rejected-NOT-APPROVED',
};

/** "24h", or "90min" for windows that are not whole hours. */
function windowLength(startMs: number, endMs: number): string {
  const minutes = Math.round((endMs - startMs) / 60_000);
  return minutes % 60 === 0 ? `${minutes / 60}h` : `${minutes}min`;
}

export function exportFileName(p: FileNameParts): string {
  const parts = [
    'slackwater',
    slug(p.siteName, 20),
    compactInstant(p.startMs, p.timezone),
    windowLength(p.startMs, p.endMs),
    `plan-${slug(p.planId, 8)}`,
    STATUS_PART[p.status],
  ];
  return `${parts.join('_')}.csv`;
}
