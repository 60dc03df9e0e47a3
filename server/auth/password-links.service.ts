/**
 * One-time links for invitations and password resets: a random 256-bit token sent by
 * e-mail, stored only as its SHA-256, valid once and for a limited time.
 */
import { createHash, randomBytes } from 'node:crypto';
import type { PasswordLinkInfo } from '@shared/schemas/auth';
import { getDb, type DbOrTx } from '../db/client';
import { AppError } from '../http/app-error';
import { recordAudit, type AnonymousAuthor } from '../audit/audit.service';
import * as repo from './auth.repo';
import { linkLifetimeHours } from './password-link-mail';
import { hashPassword } from './password-hash';
import { assertAcceptablePassword } from './password-policy';

const sha256 = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');

/** Creates a link for a user and returns its token (the only time the token exists in clear). */
export async function issueLink(db: DbOrTx, userId: string, purpose: repo.LinkPurpose): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  await repo.deleteUnusedLinks(db, userId);
  await repo.insertLinkToken(db, userId, purpose, sha256(token), new Date(Date.now() + linkLifetimeHours[purpose] * 3600_000));
  return token;
}

type LinkRow = NonNullable<Awaited<ReturnType<typeof repo.findLink>>>;

function usableLink(row: LinkRow | undefined): LinkRow {
  if (!row)
    throw new AppError('link_invalid', 'This link is not valid. Copy the whole link from the e-mail, or ask for a new one.', 400);
  if (row.link.usedAt) throw new AppError('link_used', 'This link was already used. Sign in, or ask for a new link.', 410);
  if (row.link.expiresAt.getTime() <= Date.now()) {
    throw new AppError('link_expired', `This link expired at ${row.link.expiresAt.toISOString()}. Ask for a new one.`, 410);
  }
  if (row.user.disabled) throw new AppError('account_disabled', 'This account is disabled. Ask an administrator.', 410);
  if (row.user.kind === 'service') throw new AppError('link_invalid', 'Service users have no password.', 400);
  return row;
}

export async function checkLink(token: string): Promise<PasswordLinkInfo> {
  const { link, user } = usableLink(await repo.findLink(getDb(), sha256(token)));
  return { purpose: link.purpose, email: user.email, name: user.name, expiresAt: link.expiresAt.toISOString() };
}

/**
 * Sets the password and spends the link in one transaction; the link row is locked, so
 * of two simultaneous redemptions exactly one succeeds. A password the policy refuses
 * leaves the link usable. Returns the user whose sessions must now end.
 */
export async function redeemLink(token: string, password: string, who: AnonymousAuthor): Promise<{ userId: string }> {
  return getDb().transaction(async (tx) => {
    const { link, user } = usableLink(await repo.findLink(tx, sha256(token), true));
    assertAcceptablePassword(password, { email: user.email, name: user.name });
    await repo.setPasswordHash(tx, user.id, await hashPassword(password));
    await repo.markLinkUsed(tx, link.id);
    await repo.deleteUnusedLinks(tx, user.id);
    await recordAudit(
      tx,
      { ...who, actorId: user.id, actorEmail: user.email },
      {
        action: link.purpose === 'invite' ? 'auth.password_set' : 'auth.password_reset',
        entityType: 'user',
        entityId: user.id,
      },
    );
    return { userId: user.id };
  });
}
