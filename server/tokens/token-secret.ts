/**
 * The token string and its check. A token is `swt_<id>_<secret>`: the row id (so a
 * request finds its row without searching by secret) and 256 random bits. Only the
 * secret's SHA-256 is stored; a presented secret is hashed and compared with
 * `timingSafeEqual`, so the time taken says nothing about how much of it matched.
 */
import { createHash, randomBytes, randomUUID, timingSafeEqual } from 'node:crypto';
import { TOKEN_PATTERN } from '@shared/schemas/tokens';

export interface NewTokenSecret {
  id: string;
  token: string;
  secretSha256: string;
}

const sha256Hex = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

/** A fresh id and secret; the token string exists only in the answer that creates it. */
export function newTokenSecret(): NewTokenSecret {
  const id = randomUUID();
  const secret = randomBytes(32).toString('base64url');
  return { id, token: `swt_${id.replaceAll('-', '')}_${secret}`, secretSha256: sha256Hex(secret) };
}

/** The id and secret of a well-formed token, or null. */
export function parseToken(token: string): { id: string; secret: string } | null {
  const match = TOKEN_PATTERN.exec(token);
  if (!match?.[1] || !match[2]) return null;
  const hex = match[1];
  const id = `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
  return { id, secret: match[2] };
}

/** Hash of a secret nobody holds, compared against when no row matched, so both paths take the same time. */
const unmatchable = sha256Hex(randomBytes(32).toString('base64url'));

export function secretMatches(secret: string, storedSha256: string | undefined): boolean {
  const presented = Buffer.from(sha256Hex(secret), 'hex');
  const stored = Buffer.from(storedSha256 ?? unmatchable, 'hex');
  const equal = stored.length === presented.length && timingSafeEqual(presented, stored);
  return equal && storedSha256 !== undefined;
}

/** Anything in a URL that looks like one of our tokens. */
export const TOKEN_IN_TEXT = /swt_[0-9a-f]{32}_/;
