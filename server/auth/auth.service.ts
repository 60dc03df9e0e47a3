/** Sign-in with rate limiting, password change, and "forgot password" requests. */
import type { AuthUser } from '@shared/schemas/auth';
import { getDb } from '../db/client';
import { AppError, unprocessable } from '../http/app-error';
import { logger } from '../logger';
import { recordAudit, type AnonymousAuthor } from '../audit/audit.service';
import { sendMail } from '../mail/mail.service';
import * as repo from './auth.repo';
import { hashPassword, needsRehash, spendVerifyTime, verifyPassword } from './password-hash';
import { assertAcceptablePassword } from './password-policy';
import { issueLink } from './password-links.service';
import { passwordLinkMail, passwordLinkUrl } from './password-link-mail';
import { sessionPolicy } from './session';

/**
 * At most 100 failed sign-ins per account per hour (ASVS 4.0.3 2.2.1) and a looser
 * limit per client address, counted in the database so every process agrees.
 */
export const attemptLimits = {
  'sign-in': { perAccount: 100, perAddress: 300 },
  'reset-request': { perAccount: 5, perAddress: 30 },
} as const;
const windowMs = 3600_000;

/** The one answer for an unknown e-mail, a wrong password, a disabled account (ASVS 5.0 6.3.8). */
export const wrongCredentials = () => new AppError('invalid_credentials', 'The e-mail address or the password is wrong.', 401);

function tooMany(oldestAt: Date | null) {
  const retryAfter = Math.max(60, Math.ceil(((oldestAt?.getTime() ?? Date.now()) + windowMs - Date.now()) / 1000));
  return new AppError(
    'rate_limited',
    `Too many failed attempts. Try again in about ${Math.ceil(retryAfter / 60)} minutes.`,
    429,
    undefined,
    {
      retryAfterSeconds: retryAfter,
    },
  );
}

type Outcome = { user: AuthUser } | { error: AppError };

export async function signIn(email: string, password: string, ip: string): Promise<AuthUser> {
  const outcome = await getDb().transaction(async (tx): Promise<Outcome> => {
    await repo.lockAccountAttempts(tx, 'sign-in', email);
    const limits = attemptLimits['sign-in'];
    const failures = await repo.recentFailures(tx, 'sign-in', email, ip, new Date(Date.now() - windowMs));
    if (failures.byEmail >= limits.perAccount || failures.byIp >= limits.perAddress) {
      const reason = failures.byEmail >= limits.perAccount ? 'account limit' : 'address limit';
      await recordAudit(tx, { actorEmail: email, ip }, { action: 'auth.sign_in_blocked', details: { reason } });
      return { error: tooMany(failures.oldestAt) };
    }
    const user = await repo.findUserByEmail(tx, email);
    const ok = user?.passwordHash ? await verifyPassword(user.passwordHash, password) : await spendVerifyTime(password);
    if (!user || !ok || user.disabled) {
      const reason = !user
        ? 'unknown e-mail'
        : !user.passwordHash
          ? 'no password set yet'
          : !ok
            ? 'wrong password'
            : 'account disabled';
      await repo.recordAttempt(tx, 'sign-in', email, ip, false);
      await recordAudit(
        tx,
        { actorId: user?.id ?? null, actorEmail: email, ip },
        { action: 'auth.sign_in_failed', details: { reason } },
      );
      return { error: wrongCredentials() };
    }
    await repo.recordAttempt(tx, 'sign-in', email, ip, true);
    await repo.markSignedIn(
      tx,
      user.id,
      user.passwordHash && needsRehash(user.passwordHash) ? await hashPassword(password) : undefined,
    );
    await recordAudit(
      tx,
      { actorId: user.id, actorEmail: user.email, ip },
      { action: 'auth.sign_in', entityType: 'user', entityId: user.id },
    );
    return { user: { id: user.id, email: user.email, name: user.name, role: user.role } };
  });
  // Housekeeping outside the sign-in transaction; a failure here must not fail a sign-in.
  Promise.all([repo.pruneAttempts(getDb()), repo.pruneSessions(getDb(), sessionPolicy.absoluteHours)]).catch((error: unknown) =>
    logger.error('Could not prune old sign-in attempts or sessions', error),
  );
  if ('error' in outcome) throw outcome.error;
  return outcome.user;
}

/** Checks the current password (counted like a sign-in failure when wrong) and stores the new one. */
export async function changePassword(user: AuthUser, currentPassword: string, newPassword: string, ip: string): Promise<void> {
  const outcome = await getDb().transaction(async (tx): Promise<AppError | null> => {
    await repo.lockAccountAttempts(tx, 'sign-in', user.email);
    const failures = await repo.recentFailures(tx, 'sign-in', user.email, ip, new Date(Date.now() - windowMs));
    if (failures.byEmail >= attemptLimits['sign-in'].perAccount) return tooMany(failures.oldestAt);
    const row = await repo.findUserById(tx, user.id);
    if (!row?.passwordHash || !(await verifyPassword(row.passwordHash, currentPassword))) {
      await repo.recordAttempt(tx, 'sign-in', user.email, ip, false);
      await recordAudit(
        tx,
        { actorId: user.id, actorEmail: user.email, ip },
        { action: 'auth.password_change_failed', entityType: 'user', entityId: user.id },
      );
      return unprocessable('The password was not changed: see issues.', [
        { path: 'currentPassword', message: 'The current password is wrong.' },
      ]);
    }
    assertAcceptablePassword(newPassword, { email: row.email, name: row.name }, 'newPassword');
    await repo.setPasswordHash(tx, user.id, await hashPassword(newPassword));
    await recordAudit(
      tx,
      { actorId: user.id, actorEmail: user.email, ip },
      { action: 'auth.password_changed', entityType: 'user', entityId: user.id },
    );
    return null;
  });
  if (outcome) throw outcome;
}

/**
 * "Forgot password": e-mails a reset link when the address belongs to an active account.
 * The caller answers the same whatever happens, and the e-mail is sent after the answer,
 * so neither the body nor the timing reveals whether an account exists.
 */
export async function requestPasswordReset(email: string, ip: string, appOrigin: string): Promise<() => Promise<void>> {
  const limits = attemptLimits['reset-request'];
  const plan = await getDb().transaction(async (tx) => {
    await repo.lockAccountAttempts(tx, 'reset-request', email);
    const recent = await repo.recentFailures(tx, 'reset-request', email, ip, new Date(Date.now() - windowMs));
    if (recent.byIp >= limits.perAddress) return { error: tooMany(recent.oldestAt) };
    // Requests count as "failures" so they are rate limited; none of them is a success.
    await repo.recordAttempt(tx, 'reset-request', email, ip, false);
    const user = await repo.findUserByEmail(tx, email);
    // Service users never get a password, so never a reset link (server/tokens/service-users.service.ts).
    const send = !!user && !user.disabled && user.kind === 'person' && recent.byEmail < limits.perAccount;
    await recordAudit(
      tx,
      { actorId: user?.id ?? null, actorEmail: email, ip },
      {
        action: 'auth.password_reset_requested',
        details: { known: !!user, sent: send },
      },
    );
    if (!send || !user) return { user: null };
    return { user, token: await issueLink(tx, user.id, 'reset') };
  });
  if ('error' in plan) throw plan.error;
  const { user } = plan;
  if (!user || !('token' in plan)) return async () => undefined;
  const mail = passwordLinkMail('reset', user, passwordLinkUrl(appOrigin, plan.token));
  return () => sendMail(mail);
}

/** The audit row of a sign-out (the session itself ends in the session store). */
export async function recordSignOut(author: AnonymousAuthor, userId: string | undefined): Promise<void> {
  await recordAudit(getDb(), author, { action: 'auth.sign_out', entityType: 'user', entityId: userId });
}
