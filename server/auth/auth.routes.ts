/** Sign-in, sign-out, the current user, and password links. HTTP only: rules live in the services. */
import { Router, type Response } from 'express';
import {
  passwordChangeSchema,
  passwordLinkCheckSchema,
  passwordLinkRedeemSchema,
  passwordResetRequestSchema,
  signInRequestSchema,
} from '@shared/schemas/auth';
import { AppError } from '../http/app-error';
import { logger } from '../logger';
import { requestAuthor } from '../http/request-context';
import { appConfig, clientIp, requireUser } from './current-user';
import { appendCookie, storeFor } from './session-middleware';
import { changePassword, recordSignOut, requestPasswordReset, signIn } from './auth.service';
import { checkLink, redeemLink } from './password-links.service';

export const authRouter = Router();

function sendRetryAfter(res: Response, error: unknown) {
  if (error instanceof AppError && error.status === 429 && typeof error.extra?.retryAfterSeconds === 'number') {
    res.setHeader('Retry-After', String(error.extra.retryAfterSeconds));
  }
}

authRouter.post('/auth/sign-in', async (req, res) => {
  const { email, password } = signInRequestSchema.parse(req.body);
  const store = storeFor(appConfig(req));
  let user;
  try {
    user = await signIn(email, password, clientIp(req));
  } catch (error) {
    sendRetryAfter(res, error);
    throw error;
  }
  // A new session on every sign-in; a session the browser still carried ends (ASVS 5.0 7.2.4).
  if (req.sessionId) await store.invalidate(req.sessionId);
  const { cookie } = await store.create(user.id);
  appendCookie(res, cookie);
  res.json(user);
});

authRouter.post('/auth/sign-out', async (req, res) => {
  const store = storeFor(appConfig(req));
  if (req.sessionId) {
    await store.invalidate(req.sessionId);
    await recordSignOut(requestAuthor(req), req.user?.id);
  }
  appendCookie(res, store.blankCookie());
  res.status(204).end();
});

authRouter.get('/auth/me', (req, res) => {
  res.json(requireUser(req));
});

/** Change one's own password: every session of the user ends, this browser gets a new one. */
authRouter.post('/auth/password', async (req, res) => {
  const user = requireUser(req);
  const { currentPassword, newPassword } = passwordChangeSchema.parse(req.body);
  try {
    await changePassword(user, currentPassword, newPassword, clientIp(req));
  } catch (error) {
    sendRetryAfter(res, error);
    throw error;
  }
  const store = storeFor(appConfig(req));
  await store.invalidateUser(user.id);
  appendCookie(res, (await store.create(user.id)).cookie);
  res.status(204).end();
});

authRouter.post('/auth/password-reset', async (req, res) => {
  const { email } = passwordResetRequestSchema.parse(req.body);
  let send: () => Promise<void>;
  try {
    send = await requestPasswordReset(email, clientIp(req), appConfig(req).appOrigin);
  } catch (error) {
    sendRetryAfter(res, error);
    throw error;
  }
  res
    .status(202)
    .json({ message: 'If this address belongs to an active account, a reset link is on its way. It works once, for one hour.' });
  send().catch((error: unknown) => logger.error('The password reset e-mail could not be sent', error));
});

authRouter.post('/auth/password-links/check', async (req, res) => {
  const { token } = passwordLinkCheckSchema.parse(req.body);
  res.json(await checkLink(token));
});

/** Sets the password from an invitation or reset link; every session of that user ends. */
authRouter.post('/auth/password-links/redeem', async (req, res) => {
  const { token, password } = passwordLinkRedeemSchema.parse(req.body);
  const { userId } = await redeemLink(token, password, { ip: clientIp(req) });
  await storeFor(appConfig(req)).invalidateUser(userId);
  res.status(204).end();
});
