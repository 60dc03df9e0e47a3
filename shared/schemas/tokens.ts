/**
 * API tokens and service users (`GET|POST /api/tokens`, `DELETE /api/tokens/:id`,
 * `/api/service-users`). A token acts as its user, with the user's current role; its
 * secret is shown once, in the answer that creates it, and never again.
 */
import { z } from 'zod';
import { roleSchema, roles } from './auth';

/** Default and longest lifetime of a token, in days. */
export const TOKEN_LIFETIME_DAYS = { default: 90, max: 365 } as const;

/** What a token looks like: `swt_`, the token id (32 hex digits), `_`, 43 base64url characters (256 random bits). */
export const TOKEN_PATTERN = /^swt_([0-9a-f]{32})_([A-Za-z0-9_-]{43})$/;

const tokenNameSchema = z
  .string({ error: 'Give the token a name, e.g. "nightly forecast push".' })
  .trim()
  .min(1, 'Give the token a name, e.g. "nightly forecast push".')
  .max(80, 'A token name has at most 80 characters.')
  .refine((s) => !/[\u0000-\u001f\u007f]/.test(s), 'A token name cannot hold line breaks or control characters.');

export const tokenCreateSchema = z.strictObject({
  name: tokenNameSchema,
  expiresInDays: z
    .number({ error: `Give the lifetime in whole days, 1 to ${TOKEN_LIFETIME_DAYS.max}.` })
    .int('Give the lifetime in whole days.')
    .min(1, 'A token lives at least 1 day.')
    .max(TOKEN_LIFETIME_DAYS.max, `A token lives at most ${TOKEN_LIFETIME_DAYS.max} days (one year): create a new one then.`)
    .default(TOKEN_LIFETIME_DAYS.default),
});
export type TokenCreateInput = z.input<typeof tokenCreateSchema>;

/** One token as listed (never its secret). */
export const apiTokenSchema = z
  .object({
    id: z.uuid(),
    name: z.string(),
    expiresAt: z.iso.datetime(),
    lastUsedAt: z.iso.datetime().nullable(),
    lastUsedIp: z.string().nullable(),
    createdAt: z.iso.datetime(),
  })
  .meta({ id: 'ApiToken' });
export type ApiToken = z.infer<typeof apiTokenSchema>;

export const apiTokenListSchema = z.array(apiTokenSchema);

/** The answer of `POST /api/tokens`: the only time `token` is ever shown. */
export const createdTokenSchema = z
  .object({
    id: z.uuid(),
    name: z.string(),
    token: z.string().regex(TOKEN_PATTERN),
    expiresAt: z.iso.datetime(),
  })
  .meta({ id: 'CreatedApiToken' });
export type CreatedToken = z.infer<typeof createdTokenSchema>;

export const serviceUserCreateSchema = z.strictObject({
  name: z
    .string({ error: 'Give the service user a name, e.g. "Forecast pipeline".' })
    .trim()
    .min(1, 'Give the service user a name, e.g. "Forecast pipeline".')
    .max(100, 'A name has at most 100 characters.'),
  role: roleSchema,
});
export type ServiceUserCreateInput = z.input<typeof serviceUserCreateSchema>;

/** A user that only acts through tokens: it has no password and cannot sign in. */
export const serviceUserSchema = z
  .object({
    id: z.uuid(),
    name: z.string(),
    /** An address under `.invalid` (RFC 2606): nothing is ever mailed to a service user. */
    email: z.string(),
    role: z.enum(roles),
    disabled: z.boolean(),
    createdAt: z.iso.datetime(),
    tokens: z.array(apiTokenSchema),
  })
  .meta({ id: 'ServiceUser' });
export type ServiceUser = z.infer<typeof serviceUserSchema>;

export const serviceUserListSchema = z.array(serviceUserSchema);
