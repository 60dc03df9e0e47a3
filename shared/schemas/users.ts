/** Users as the admin page sees them, and the admin's requests. */
import { z } from 'zod';
import { emailSchema, roleSchema, roles } from './auth';

export const userStatuses = ['active', 'invited', 'disabled'] as const;
export type UserStatus = (typeof userStatuses)[number];

export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: z.enum(roles),
  status: z.enum(userStatuses),
  createdAt: z.string(),
  lastSignInAt: z.string().nullable(),
});
export type User = z.infer<typeof userSchema>;

const nameSchema = z
  .string({ error: 'A name is required.' })
  .trim()
  .min(1, 'A name is required.')
  .max(100, 'A name has at most 100 characters.');

export const inviteUserSchema = z.strictObject({ email: emailSchema, name: nameSchema, role: roleSchema });
export type InviteUserRequest = z.input<typeof inviteUserSchema>;

/** What an admin may change. Unknown keys are refused rather than ignored (no mass assignment). */
export const updateUserSchema = z
  .strictObject({ name: nameSchema.optional(), role: roleSchema.optional(), disabled: z.boolean().optional() })
  .refine((u) => u.name !== undefined || u.role !== undefined || u.disabled !== undefined, {
    message: 'Send at least one of name, role or disabled.',
  });
export type UpdateUserRequest = z.input<typeof updateUserSchema>;

export const userIdParamSchema = z.string().min(1).max(64);

export const inviteResultSchema = z.object({ user: userSchema, mail: z.enum(['sent', 'failed']) });
export type InviteResult = z.infer<typeof inviteResultSchema>;
