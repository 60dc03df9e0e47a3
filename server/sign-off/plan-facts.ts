/**
 * What the sign-off screens, e-mails and exports say about a plan, read from
 * its inputs snapshot (site and battery as they were when the plan was made,
 * which is also what the checksum covers).
 */
import { createZoneClock, formatInstant } from '@shared/profile-csv';
import type { PlanInputs } from '@shared/schemas/plan';

export interface PlanFacts {
  siteName: string;
  batteryName: string;
  timezone: string;
  currency: string;
  /** "2026-03-29 00:00 to 2026-03-30 00:00 (Europe/Berlin)" */
  window: string;
}

interface PlanLike {
  inputs: PlanInputs;
  deliveryStart: Date;
  deliveryEnd: Date;
}

function localText(ms: number, timezone: string): string {
  const clock = createZoneClock(timezone);
  return clock ? formatInstant(ms, clock).slice(0, 16).replace('T', ' ') : new Date(ms).toISOString();
}

export function planFacts(plan: PlanLike): PlanFacts {
  const site = plan.inputs.site;
  const timezone = site?.timezone ?? 'UTC';
  return {
    siteName: site?.name ?? 'unknown site',
    batteryName: plan.inputs.battery?.name ?? 'unknown battery',
    timezone,
    currency: site?.currency ?? 'EUR',
    window: `${localText(plan.deliveryStart.getTime(), timezone)} to ${localText(plan.deliveryEnd.getTime(), timezone)} (${timezone})`,
  };
}
