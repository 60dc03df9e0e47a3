/** The audit trail as the admin page reads it. */
import { z } from 'zod';

export const auditEventSchema = z.object({
  id: z.number(),
  at: z.string(),
  actorId: z.string().nullable(),
  actorEmail: z.string().nullable(),
  action: z.string(),
  entityType: z.string().nullable(),
  entityId: z.string().nullable(),
  ip: z.string().nullable(),
  /** `token <name>` when the action came through an API token, else null. */
  via: z.string().nullable(),
  viaTokenId: z.string().nullable(),
  details: z.record(z.string(), z.unknown()),
  /** The entity's name as it is now (a plan or study: its battery and start), or null when it is gone or has none. */
  entityName: z.string().nullable(),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `At most ${max} characters.`)
    .optional()
    .transform((s) => (s ? s : undefined));

const optionalInstant = z
  .string()
  .trim()
  .optional()
  .transform((s, ctx) => {
    if (!s) return undefined;
    const date = new Date(s);
    if (Number.isNaN(date.getTime())) {
      ctx.addIssue({ code: 'custom', message: 'Use an ISO 8601 date or instant, e.g. 2026-03-01 or 2026-03-01T08:00:00Z.' });
      return z.NEVER;
    }
    return date;
  });

/** Query string of `GET /api/audit`. `action` matches a prefix ("auth." finds every sign-in event). */
export const auditQuerySchema = z.strictObject({
  action: optionalText(100),
  actor: optionalText(254),
  entityType: optionalText(50),
  entityId: optionalText(100),
  from: optionalInstant,
  to: optionalInstant,
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});
export type AuditQuery = z.input<typeof auditQuerySchema>;
export type AuditFilters = z.output<typeof auditQuerySchema>;

export const auditPageSchema = z.object({
  events: z.array(auditEventSchema),
  nextBefore: z.number().nullable(),
  /** Names of the ids the page's details mention (siteId, batteryId, …), id → name, for the ones that still exist. */
  names: z.record(z.string(), z.string()),
});
export type AuditPage = z.infer<typeof auditPageSchema>;
