/** Roles, what each may do, and the sign-in and password requests. */
import { z } from 'zod';

export const roles = ['admin', 'planner', 'approver', 'viewer'] as const;
export type Role = (typeof roles)[number];
export const roleSchema = z.enum(roles, { error: `Choose one of the roles: ${roles.join(', ')}.` });

/**
 * The role table as data. The server's route table and the client's hiding of
 * buttons both read it, so the two cannot drift apart.
 */
export const permissions = {
  /** read sites, batteries, profiles, plans, studies; export approved plans */
  'data.read': ['viewer', 'planner', 'approver', 'admin'],
  /** upload profiles, edit sites and batteries, run plans and studies, submit */
  'data.edit': ['planner', 'admin'],
  /** approve or reject a submitted plan (never one they submitted) */
  'plans.approve': ['approver', 'admin'],
  /** manage users and roles */
  'users.manage': ['admin'],
  'audit.read': ['admin'],
  'mail.read': ['admin'],
} as const satisfies Record<string, readonly Role[]>;
export type Action = keyof typeof permissions;

export function can(role: Role | null | undefined, action: Action): boolean {
  return role != null && (permissions[action] as readonly Role[]).includes(role);
}

export const roleLabels: Record<Role, string> = {
  admin: 'Admin',
  planner: 'Planner',
  approver: 'Approver',
  viewer: 'Viewer',
};

/** Length counted in characters (code points), not UTF-16 units: an emoji is one character. */
const length = (s: string) => [...s].length;

export const passwordRules = { min: 12, max: 128 } as const;

/** A new password's shape (ASVS 4.0.3 2.1.1-2.1.2); the server also rejects common and context words. */
export const newPasswordSchema = z
  .string({ error: 'A password is required.' })
  .refine((s) => length(s) >= passwordRules.min, `Use at least ${passwordRules.min} characters.`)
  .refine((s) => length(s) <= passwordRules.max, `Use at most ${passwordRules.max} characters.`);

export const emailSchema = z
  .string({ error: 'An e-mail address is required.' })
  .trim()
  .max(254, 'An e-mail address has at most 254 characters.')
  .pipe(z.email('Enter a valid e-mail address, e.g. name@example.com.'))
  .transform((s) => s.toLowerCase());

export const signInRequestSchema = z.strictObject({
  email: emailSchema,
  password: z
    .string({ error: 'A password is required.' })
    .min(1, 'A password is required.')
    .max(passwordRules.max * 4, 'The password is too long.'),
});
export type SignInRequest = z.input<typeof signInRequestSchema>;

export const authUserSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: z.enum(roles),
});
export type AuthUser = z.infer<typeof authUserSchema>;

const tokenSchema = z
  .string({ error: 'The link token is missing.' })
  .min(20, 'The link is incomplete: copy the whole link from the e-mail.')
  .max(200, 'The link token is too long.');

export const passwordLinkCheckSchema = z.strictObject({ token: tokenSchema });
export const passwordLinkRedeemSchema = z.strictObject({ token: tokenSchema, password: newPasswordSchema });
export const passwordResetRequestSchema = z.strictObject({ email: emailSchema });
export const passwordChangeSchema = z.strictObject({
  currentPassword: z
    .string({ error: 'Your current password is required.' })
    .min(1, 'Your current password is required.')
    .max(512),
  newPassword: newPasswordSchema,
});

export const passwordLinkInfoSchema = z.object({
  purpose: z.enum(['invite', 'reset']),
  email: z.string(),
  name: z.string(),
  expiresAt: z.string(),
});
export type PasswordLinkInfo = z.infer<typeof passwordLinkInfoSchema>;
