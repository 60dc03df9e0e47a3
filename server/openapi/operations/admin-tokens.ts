/** The audit trail, the mail outbox, API tokens and service users. */
import { z } from 'zod';
import { auditPageSchema, auditQuerySchema } from '@shared/schemas/audit';
import { mailMessageSchema, mailOutboxQuerySchema, mailSummarySchema } from '@shared/schemas/mail';
import {
  apiTokenListSchema,
  createdTokenSchema,
  serviceUserCreateSchema,
  serviceUserListSchema,
  serviceUserSchema,
  tokenCreateSchema,
} from '@shared/schemas/tokens';
import type { AccessKey } from '../../auth/access-table';
import { uuidParams, type OperationSpec } from '../operation-spec';

const tokenCreated = {
  description: 'Created. `token` is the secret: it is shown this once; store it in your secret store.',
  schema: createdTokenSchema,
};

export const adminTokenOperations = {
  'GET /api/audit': {
    tag: 'Administration',
    summary: 'The append-only audit trail, newest first, with filters and keyset paging.',
    query: auditQuerySchema,
    responses: { 200: { description: 'One page.', schema: auditPageSchema.meta({ id: 'AuditPage' }) } },
  },
  'GET /api/mail/outbox': {
    tag: 'Administration',
    summary: 'Messages the local mail server received.',
    query: mailOutboxQuerySchema,
    responses: {
      200: { description: 'The messages.', schema: z.object({ messages: z.array(mailSummarySchema) }).meta({ id: 'MailList' }) },
    },
  },
  'GET /api/mail/outbox/:id': {
    tag: 'Administration',
    summary: 'One message with its text.',
    params: z.object({ id: z.string().regex(/^\d+$/).meta({ description: 'The message number.' }) }),
    responses: { 200: { description: 'The message.', schema: mailMessageSchema.meta({ id: 'MailMessage' }) } },
  },
  'GET /api/tokens': {
    tag: 'API tokens',
    summary: 'Your API tokens (never their secrets), with when and from where each was last used.',
    responses: { 200: { description: 'Tokens that were not revoked, expired ones included.', schema: apiTokenListSchema } },
  },
  'POST /api/tokens': {
    tag: 'API tokens',
    summary: 'Create a token that acts as you, with your role. Needs a browser session.',
    body: tokenCreateSchema,
    responses: { 201: tokenCreated },
    errors: [409],
  },
  'DELETE /api/tokens/:id': {
    tag: 'API tokens',
    summary: "Revoke one of your tokens (admins: anyone's). Revoking twice is not an error.",
    params: uuidParams,
    responses: { 204: { description: 'Revoked.' } },
  },
  'GET /api/service-users': {
    tag: 'API tokens',
    summary: 'Service users (accounts for programs) with their tokens.',
    responses: { 200: { description: 'The service users.', schema: serviceUserListSchema } },
  },
  'POST /api/service-users': {
    tag: 'API tokens',
    summary: 'Create a service user: a name and a role, no password, no sign-in. Needs a browser session.',
    body: serviceUserCreateSchema,
    responses: { 201: { description: 'Created, without tokens yet.', schema: serviceUserSchema } },
  },
  'POST /api/service-users/:id/tokens': {
    tag: 'API tokens',
    summary: 'Create a token for a service user. Needs a browser session.',
    params: uuidParams,
    body: tokenCreateSchema,
    responses: { 201: tokenCreated },
    errors: [409],
  },
} as const satisfies Partial<Record<AccessKey, OperationSpec>>;
