/** Inviting users, changing roles, disabling accounts; at least one active admin always remains. */
import { randomUUID } from 'node:crypto';
import type { Role } from '@shared/schemas/auth';
import type { InviteResult, User } from '@shared/schemas/users';
import { getDb } from '../db/client';
import { conflict, notFound } from '../http/app-error';
import { logger } from '../logger';
import { recordAudit } from '../audit/audit.service';
import type { Actor } from '../http/request-context';
import { sendMail } from '../mail/mail.service';
import { issueLink } from '../auth/password-links.service';
import { passwordLinkMail, passwordLinkUrl } from '../auth/password-link-mail';
import { endUserSessions } from '../auth/session';
import { hashPassword } from '../auth/password-hash';
import { assertAcceptablePassword } from '../auth/password-policy';
import { revokeAllTokensOf } from '../tokens/tokens.service';
import * as repo from './users.repo';
import type { UserRow } from './users.schema';

export function toUser(row: UserRow): User {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    status: row.disabled ? 'disabled' : row.passwordHash ? 'active' : 'invited',
    createdAt: row.createdAt.toISOString(),
    lastSignInAt: row.lastSignInAt?.toISOString() ?? null,
  };
}

export async function listUsers(): Promise<User[]> {
  return (await repo.listUsers(getDb())).map(toUser);
}

async function mailLink(user: UserRow, token: string, admin: Actor): Promise<'sent' | 'failed'> {
  try {
    await sendMail(passwordLinkMail('invite', user, passwordLinkUrl(admin.origin, token), admin.name));
    return 'sent';
  } catch (error) {
    logger.error(`The invitation e-mail to user ${user.id} could not be sent`, error);
    return 'failed';
  }
}

export async function inviteUser(input: { email: string; name: string; role: Role }, admin: Actor): Promise<InviteResult> {
  const { user, token } = await getDb().transaction(async (tx) => {
    const created = await repo.insertUser(tx, { id: randomUUID(), email: input.email, name: input.name, role: input.role });
    if (!created) throw conflict(`A user with the e-mail ${input.email} already exists.`);
    await recordAudit(tx, admin, {
      action: 'user.invited',
      entityType: 'user',
      entityId: created.id,
      details: { email: created.email, role: created.role },
    });
    return { user: created, token: await issueLink(tx, created.id, 'invite') };
  });
  return { user: toUser(user), mail: await mailLink(user, token, admin) };
}

/** A fresh invitation link (the old one stops working) for someone who has not set a password yet. */
export async function resendInvitation(id: string, admin: Actor): Promise<InviteResult> {
  const { user, token } = await getDb().transaction(async (tx) => {
    const row = await repo.findUserById(tx, id, true);
    if (!row) throw notFound('The user');
    if (row.kind === 'service') throw conflict(`${row.name} is a service user: it never signs in, so it gets no invitation.`);
    if (row.disabled) throw conflict(`${row.email} is disabled: enable the account before inviting again.`);
    if (row.passwordHash)
      throw conflict(`${row.email} has already set a password; they can use "Forgot password" on the sign-in page.`);
    await recordAudit(tx, admin, { action: 'user.invitation_resent', entityType: 'user', entityId: row.id });
    return { user: row, token: await issueLink(tx, row.id, 'invite') };
  });
  return { user: toUser(user), mail: await mailLink(user, token, admin) };
}

function guardLastAdmin(admins: string[], row: UserRow, patch: repo.UserPatch) {
  const losesAdmin = row.role === 'admin' && !row.disabled && ((patch.role && patch.role !== 'admin') || patch.disabled === true);
  if (!losesAdmin) return;
  if (admins.filter((id) => id !== row.id).length === 0) {
    throw conflict(`${row.email} is the last active admin. Make another user admin first, so someone can still manage users.`);
  }
}

export async function updateUser(id: string, patch: repo.UserPatch, admin: Actor): Promise<User> {
  const updated = await getDb().transaction(async (tx) => {
    // Admin rows are locked before the target row, in the same order by every transaction.
    const admins = patch.role !== undefined || patch.disabled !== undefined ? await repo.lockActiveAdmins(tx) : [];
    const row = await repo.findUserById(tx, id, true);
    if (!row) throw notFound('The user');
    guardLastAdmin(admins, row, patch);
    const next = await repo.updateUser(tx, id, patch);
    if (!next) throw notFound('The user');
    const audit = (action: string, details: Record<string, unknown>) =>
      recordAudit(tx, admin, { action, entityType: 'user', entityId: id, details: { email: row.email, ...details } });
    if (patch.role && patch.role !== row.role) await audit('user.role_changed', { from: row.role, to: patch.role });
    if (patch.disabled !== undefined && patch.disabled !== row.disabled)
      await audit(patch.disabled ? 'user.disabled' : 'user.enabled', {});
    // A disabled account's API tokens are revoked with it: enabling it again does not revive them.
    if (patch.disabled === true) {
      const revoked = await revokeAllTokensOf(tx, id, admin.id, 'user disabled');
      if (revoked.length > 0) await audit('user.tokens_revoked', { tokenIds: revoked });
    }
    if (patch.name && patch.name !== row.name) await audit('user.renamed', { from: row.name, to: patch.name });
    return next;
  });
  // A disabled account's sessions end now, not at their expiry (ASVS 5.0 7.4.2).
  if (updated.disabled) await endUserSessions(id);
  return toUser(updated);
}

/**
 * The first admin of a real installation (`npm run create-admin`): the password passes
 * the same policy as every other new password.
 */
export async function createAdminAccount(input: { email: string; name: string; password: string }): Promise<User> {
  assertAcceptablePassword(input.password, { email: input.email, name: input.name });
  const passwordHash = await hashPassword(input.password);
  return getDb().transaction(async (tx) => {
    const row = await repo.insertUser(tx, {
      id: randomUUID(),
      email: input.email,
      name: input.name,
      role: 'admin',
      passwordHash,
      passwordChangedAt: new Date(),
    });
    if (!row) throw conflict(`A user with the e-mail ${input.email} already exists.`);
    await recordAudit(
      tx,
      { actorEmail: 'create-admin script' },
      { action: 'user.admin_created', entityType: 'user', entityId: row.id, details: { email: row.email } },
    );
    return toUser(row);
  });
}
