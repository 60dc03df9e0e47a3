/** Messages captured by the local fake SMTP server, as the admin's mail outbox shows them. */
import { z } from 'zod';

export const mailSummarySchema = z.object({
  id: z.number(),
  from: z.string(),
  to: z.string(),
  subject: z.string(),
  sentAt: z.string(),
});
export type MailSummary = z.infer<typeof mailSummarySchema>;

export const mailMessageSchema = mailSummarySchema.extend({ text: z.string(), html: z.string().nullable() });
export type MailMessage = z.infer<typeof mailMessageSchema>;

export const mailOutboxQuerySchema = z.strictObject({
  to: z.string().trim().max(254).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});
