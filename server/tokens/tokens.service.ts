/**
 * Creating, listing and revoking API tokens, and checking the token of a request.
 * A token acts as its user with the user's current role, so a role change applies
 * at once and a disabled account's tokens stop working (they are revoked too).
 */
import type { AuthUser } from '@shared/schemas/auth';
import type { ApiToken, CreatedToken } from '@shared/schemas/tokens';
import { getDb, type DbOrTx } from '../db/client';
import { conflict, notFound } from '../http/app-error';
import { recordAudit } from '../audit/audit.service';
import type { Actor } from '../http/request-context';
import { findUserById } from '../users/users.repo';
import * as repo from './tokens.repo';
import type { ApiTokenRow } from './tokens.schema';
import { newTokenSecret, parseToken, secretMatches } from './token-secret';

const dayMs = 86_400_000;
/** A token's last use is written at most once a minute per token (and whenever its address changes). */
const touchStepMs = 60_000;

export function toApiToken(row: ApiTokenRow): ApiToken {
  return {
    id: row.id,
    name: row.name,
    expiresAt: row.expiresAt.toISOString(),
    lastUsedAt: row.lastUsedAt?.toISOString() ?? null,
    lastUsedIp: row.lastUsedIp,
    createdAt: row.createdAt.toISOString(),
  };
}

/** A new token for `ownerId` (the caller, or a service user an admin manages). */
export async function createToken(
  ownerId: string,
  input: { name: string; expiresInDays: number },
  actor: Actor,
): Promise<CreatedToken> {
  return getDb().transaction(async (tx) => {
    // The owner's row is locked so two requests cannot both create the same name.
    const owner = await findUserById(tx, ownerId, true);
    if (!owner) throw notFound('The user');
    if (owner.disabled) throw conflict(`${owner.name} is disabled: enable the account before creating tokens for it.`);
    if (await repo.findUsableTokenNamed(tx, ownerId, input.name)) {
      throw conflict(`A token named "${input.name}" already exists and is still valid: choose another name, or revoke that one.`);
    }
    const secret = newTokenSecret();
    const now = new Date();
    const row = await repo.insertToken(tx, {
      id: secret.id,
      userId: ownerId,
      name: input.name,
      secretSha256: secret.secretSha256,
      createdBy: actor.id,
      createdAt: now,
      expiresAt: new Date(now.getTime() + input.expiresInDays * dayMs),
    });
    await recordAudit(tx, actor, {
      action: 'token.created',
      entityType: 'api_token',
      entityId: row.id,
      details: { name: row.name, userId: ownerId, expiresAt: row.expiresAt.toISOString() },
    });
    return { id: row.id, name: row.name, token: secret.token, expiresAt: row.expiresAt.toISOString() };
  });
}

export async function listTokens(userId: string): Promise<ApiToken[]> {
  return (await repo.listUnrevokedTokens(getDb(), [userId])).map(toApiToken);
}

/**
 * Revokes a token of the caller; an admin may revoke anyone's. Someone else's token
 * answers 404, as if it did not exist. Revoking twice is not an error.
 */
export async function revokeToken(tokenId: string, caller: AuthUser, actor: Actor): Promise<void> {
  await getDb().transaction(async (tx) => {
    const token = await repo.findToken(tx, tokenId);
    if (!token || (token.userId !== caller.id && caller.role !== 'admin')) throw notFound('The API token');
    const revoked = await repo.revokeToken(tx, tokenId, caller.id, token.userId === caller.id ? 'owner' : 'admin');
    if (!revoked) return;
    await recordAudit(tx, actor, {
      action: 'token.revoked',
      entityType: 'api_token',
      entityId: tokenId,
      details: { name: token.name, userId: token.userId },
    });
  });
}

/** Ends every token of a user, in the caller's transaction (an account being disabled). */
export async function revokeAllTokensOf(tx: DbOrTx, userId: string, byId: string, reason: string): Promise<string[]> {
  return repo.revokeUserTokens(tx, userId, byId, reason);
}

export type TokenCheck =
  | { ok: true; user: AuthUser; token: { id: string; name: string } }
  | { ok: false; reason: 'malformed' | 'unknown' | 'revoked' | 'expired' | 'user disabled'; tokenId?: string };

/** Checks a presented token; the reason is for logs and the audit trail, never for the answer. */
export async function checkToken(presented: string, ip: string): Promise<TokenCheck> {
  const parsed = parseToken(presented);
  if (!parsed) return { ok: false, reason: 'malformed' };
  const found = await repo.findTokenWithUser(getDb(), parsed.id);
  if (!secretMatches(parsed.secret, found?.token.secretSha256) || !found) return { ok: false, reason: 'unknown' };
  const { token, user } = found;
  if (token.revokedAt) return { ok: false, reason: 'revoked', tokenId: token.id };
  if (token.expiresAt.getTime() <= Date.now()) return { ok: false, reason: 'expired', tokenId: token.id };
  if (user.disabled) return { ok: false, reason: 'user disabled', tokenId: token.id };
  const stale = !token.lastUsedAt || Date.now() - token.lastUsedAt.getTime() >= touchStepMs || token.lastUsedIp !== ip;
  if (stale) await repo.recordTokenUse(getDb(), token.id, ip);
  return {
    ok: true,
    user: { id: user.id, email: user.email, name: user.name, role: user.role },
    token: { id: token.id, name: token.name },
  };
}
