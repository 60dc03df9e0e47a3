/** Sign-in, passwords and user administration. */
import { z } from 'zod';
import {
  authUserSchema,
  passwordChangeSchema,
  passwordLinkCheckSchema,
  passwordLinkInfoSchema,
  passwordLinkRedeemSchema,
  passwordResetRequestSchema,
  signInRequestSchema,
} from '@shared/schemas/auth';
import { inviteResultSchema, inviteUserSchema, updateUserSchema, userSchema } from '@shared/schemas/users';
import { healthSchema, messageSchema } from '@shared/schemas/responses/common';
import type { AccessKey } from '../../auth/access-table';
import { uuidParams, type OperationSpec } from '../operation-spec';

const me = authUserSchema.meta({ id: 'AuthUser' });
const user = userSchema.meta({ id: 'User' });
const invited = inviteResultSchema.meta({ id: 'InviteResult' });

export const authUserOperations = {
  'GET /api/health': {
    tag: 'System',
    summary: 'Is the server up and its database reachable?',
    responses: {
      200: { description: 'Up.', schema: healthSchema },
      503: { description: 'The database is down.', schema: healthSchema },
    },
  },
  'POST /api/auth/sign-in': {
    tag: 'Sign-in',
    summary: 'Sign in with e-mail and password; starts a browser session (cookie).',
    body: signInRequestSchema,
    responses: { 200: { description: 'Signed in; the session cookie is set.', schema: me } },
    errors: [401, 429],
  },
  'POST /api/auth/sign-out': {
    tag: 'Sign-in',
    summary: "End the caller's browser session, if there is one.",
    responses: { 204: { description: 'Signed out.' } },
  },
  'GET /api/auth/me': {
    tag: 'Sign-in',
    summary: 'Who am I? (the user behind the session or token)',
    responses: { 200: { description: 'The current user.', schema: me } },
  },
  'POST /api/auth/password': {
    tag: 'Sign-in',
    summary: 'Change your own password (needs the current one); every other session ends.',
    body: passwordChangeSchema,
    responses: { 204: { description: 'Changed; this browser gets a new session.' } },
    errors: [429],
  },
  'POST /api/auth/password-reset': {
    tag: 'Sign-in',
    summary: 'Ask for a password reset link by e-mail (the same answer whether or not the address is known).',
    body: passwordResetRequestSchema,
    responses: { 202: { description: 'If the account exists, a link is on its way.', schema: messageSchema } },
    errors: [429],
  },
  'POST /api/auth/password-links/check': {
    tag: 'Sign-in',
    summary: 'Check an invitation or reset link before asking for a password.',
    body: passwordLinkCheckSchema,
    responses: { 200: { description: 'The link is usable.', schema: passwordLinkInfoSchema.meta({ id: 'PasswordLinkInfo' }) } },
    errors: [400, 410],
  },
  'POST /api/auth/password-links/redeem': {
    tag: 'Sign-in',
    summary: 'Set a password with an invitation or reset link (works once).',
    body: passwordLinkRedeemSchema,
    responses: { 204: { description: 'Password set; sign in with it.' } },
    errors: [400, 410],
  },
  'GET /api/users': {
    tag: 'Users',
    summary: 'People who may sign in (service users are listed apart).',
    responses: { 200: { description: 'Every person.', schema: z.object({ users: z.array(user) }).meta({ id: 'UserList' }) } },
  },
  'POST /api/users': {
    tag: 'Users',
    summary: 'Invite a person by e-mail with a role; they set their password through the link.',
    body: inviteUserSchema,
    responses: { 201: { description: 'Invited.', schema: invited } },
    errors: [409],
  },
  'PATCH /api/users/:id': {
    tag: 'Users',
    summary: 'Rename, change the role of, disable or enable a user (disabling ends sessions and revokes tokens).',
    params: uuidParams,
    body: updateUserSchema,
    responses: { 200: { description: 'The user as changed.', schema: user } },
    errors: [409],
  },
  'POST /api/users/:id/invitations': {
    tag: 'Users',
    summary: 'Send a fresh invitation link to someone who has not set a password yet.',
    params: uuidParams,
    responses: { 202: { description: 'Sent (or `mail: failed`).', schema: invited } },
    errors: [409],
  },
} as const satisfies Partial<Record<AccessKey, OperationSpec>>;
