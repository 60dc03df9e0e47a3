/**
 * The sign-off checksum: SHA-256 (FIPS 180-4) over the canonical JSON
 * (RFC 8785) of the plan id, its inputs snapshot and its results. Stored at
 * approval and recomputed on every export and after a restore: a mismatch
 * means the stored plan is no longer what was signed off.
 */
import { createHash, timingSafeEqual } from 'node:crypto';
import { canonicalJson } from './canonical-json';

export interface ChecksumContent {
  readonly planId: string;
  readonly inputs: unknown;
  readonly results: unknown;
}

/** The exact text that is hashed; exposed so an auditor can reproduce the checksum outside Slackwater. */
export function checksumText(content: ChecksumContent): string {
  return canonicalJson({ planId: content.planId, inputs: content.inputs, results: content.results });
}

/** Lower-case hexadecimal SHA-256 of checksumText(content). */
export function planChecksum(content: ChecksumContent): string {
  return createHash('sha256').update(checksumText(content), 'utf8').digest('hex');
}

/** True when `stored` is the checksum of `content` (constant-time comparison). */
export function checksumMatches(stored: string | null | undefined, content: ChecksumContent): boolean {
  if (!stored || !/^[0-9a-f]{64}$/.test(stored)) return false;
  return timingSafeEqual(Buffer.from(stored, 'hex'), Buffer.from(planChecksum(content), 'hex'));
}
