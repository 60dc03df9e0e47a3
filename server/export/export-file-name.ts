/**
 * The export's file name: site, delivery window (local time with offset),
 * plan id, status, and for signed-off plans the checksum, so a file lying in
 * a shared folder still says what it is. ASCII only, no characters that file
 * systems or the Content-Disposition header (RFC 6266) treat specially.
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
  readonly checksum: string | null;
}

/** Lower-case ASCII words joined by hyphens; accents dropped, anything else becomes a separator. */
export function slug(text: string, max = 40): string {
  const ascii = text.normalize('NFKD').replace(/[\u0300-\u036f]/g, '');
  const words = ascii
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return words.slice(0, max).replace(/-+$/, '') || 'site';
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

export function exportFileName(p: FileNameParts): string {
  const parts = [
    'slackwater',
    slug(p.siteName),
    `${compactInstant(p.startMs, p.timezone)}_to_${compactInstant(p.endMs, p.timezone)}`,
    `plan-${p.planId}`,
    STATUS_PART[p.status],
  ];
  if (p.checksum && (p.status === 'approved' || p.status === 'superseded')) parts.push(`sha256-${p.checksum}`);
  return `${parts.join('_')}.csv`;
}
