/**
 * The sign-off contract: request bodies of
 * `POST /api/plans/:id/submit|approve|reject|copy`, the plan's sign-off
 * history and the "awaiting my sign-off" list. `status`, `approvedBy` and the
 * like are never read from a request body (SECURITY.md, ASVS 5.0 15.3.3).
 */
import { z } from 'zod';

export const PLAN_STATUSES = ['draft', 'submitted', 'approved', 'rejected', 'superseded'] as const;
export type PlanStatus = (typeof PLAN_STATUSES)[number];

const comment = z
  .string()
  .trim()
  .max(2000, 'Keep the comment under 2000 characters.')
  .transform((c) => (c === '' ? undefined : c));

const version = z
  .number({ error: 'Send the version of the plan you looked at (a whole number), so a stale page cannot act on a changed plan.' })
  .int('The version is a whole number.')
  .min(0, 'The version is not negative.');

/** submit and approve: an optional comment and the version the user looked at. */
export const signOffActionSchema = z.strictObject({ comment: comment.optional(), version });
export type SignOffAction = z.infer<typeof signOffActionSchema>;

/** reject: the submitter needs to know why, so the comment is required. */
export const rejectActionSchema = z.strictObject({
  comment: z
    .string({ error: 'Say why the plan is rejected: the planner receives this comment.' })
    .trim()
    .min(1, 'Say why the plan is rejected: the planner receives this comment.')
    .max(2000, 'Keep the comment under 2000 characters.'),
  version,
});

export const copyActionSchema = z.strictObject({});

export const PLAN_EVENT_ACTIONS = ['submitted', 'approved', 'rejected', 'superseded', 'copied'] as const;
export type PlanEventAction = (typeof PLAN_EVENT_ACTIONS)[number];

export interface PlanEvent {
  id: number;
  at: string;
  action: PlanEventAction;
  actorId: string | null;
  actorName: string | null;
  actorEmail: string | null;
  fromStatus: string | null;
  toStatus: string | null;
  /** The plan's version after the action. */
  version: number | null;
  comment: string | null;
  details: Record<string, unknown>;
}

export interface PersonAt {
  id: string;
  name: string | null;
  email: string | null;
  at: string;
}

/** `GET /api/plans/:id/sign-off`: who submitted, who signed off, when, the checksum and every event. */
export interface SignOffRecord {
  planId: string;
  status: PlanStatus;
  version: number;
  created: PersonAt | null;
  submitted: PersonAt | null;
  approved: (PersonAt & { comment: string | null }) | null;
  rejected: (PersonAt & { comment: string | null }) | null;
  superseded: { at: string; byPlanId: string } | null;
  checksum: string | null;
  /** Recomputed now from the stored inputs and results; null when the plan has no checksum yet. */
  checksumVerified: boolean | null;
  copiedFrom: string | null;
  events: PlanEvent[];
  /** What the signed-in user may do next, so the page shows only those buttons (the server decides anyway). */
  can: { submit: boolean; approve: boolean; reject: boolean; copy: boolean; export: boolean };
}

/** One row of `GET /api/sign-off/pending`: submitted plans the signed-in user may sign off. */
export interface PendingSignOff {
  planId: string;
  version: number;
  siteId: string | null;
  siteName: string | null;
  batteryName: string | null;
  deliveryStart: string;
  deliveryEnd: string;
  submittedAt: string | null;
  submittedBy: { id: string; name: string | null; email: string | null };
}

/**
 * The cautions (docs/model.md; the standards in docs/sources.md), shown on the sign-off screen, written into
 * every export and opening the README section on exports. Standards named after
 * docs/sources.md, "Cautions: standards to defer to".
 */
export const SIGN_OFF_CAUTIONS: readonly string[] = [
  'This schedule is decision support, not an instruction: qualified personnel decide dispatch.',
  "Check it against the interconnection agreement, the applicable grid code (e.g. IEEE 1547-2018 or IEEE 2800-2022 where they apply) and the system operator's instructions, which override any schedule.",
  "Check it against the battery maker's operating limits (power, state-of-charge window, temperature, cycling).",
  "Check it against the site's fire and safety requirements (e.g. NFPA 855, UL 9540 and UL 9540A, IEC 62933-5).",
];
