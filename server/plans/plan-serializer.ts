import type { Plan } from '@shared/schemas/plan';
import { runJobOf } from '../runs/create-run';
import type { RunJobRow } from '../runs/run-columns';
import type { PlanHeadline } from './plans.repo';
import type { PlanRow } from './plans.schema';

const isoOrNull = (d: Date | null) => (d ? d.toISOString() : null);

interface JoinedRow {
  plan: Omit<PlanRow, 'results' | 'inputs'> & Partial<Pick<PlanRow, 'results' | 'inputs'>>;
  siteName: string | null;
  batteryName: string | null;
  createdByName: string | null;
  job: RunJobRow | null;
  headline?: PlanHeadline | null;
}

/** The API shape; `detail` adds the inputs snapshot and the results. */
export function toPlan(row: JoinedRow, detail: boolean): Plan {
  const p = row.plan;
  const plan: Plan = {
    id: p.id,
    siteId: p.siteId,
    siteName: row.siteName,
    batteryId: p.batteryId,
    batteryName: row.batteryName,
    priceProfileId: p.priceProfileId,
    loadProfileId: p.loadProfileId,
    generationProfileId: p.generationProfileId,
    deliveryStart: p.deliveryStart.toISOString(),
    deliveryEnd: p.deliveryEnd.toISOString(),
    horizonHours: p.horizonHours,
    terminalRule: p.terminalRule,
    initialSocPct: p.initialSocPct,
    status: p.status,
    version: p.version,
    inputVersion: p.inputVersion,
    createdBy: { id: p.createdBy, name: row.createdByName },
    createdAt: p.createdAt.toISOString(),
    submittedAt: isoOrNull(p.submittedAt),
    approvedAt: isoOrNull(p.approvedAt),
    method: p.method === 'dp' || p.method === 'lp' ? p.method : null,
    errorMessage: p.errorMessage,
    job: runJobOf(row.job),
  };
  if (detail) {
    if (p.inputs) plan.inputs = p.inputs;
    plan.results = p.results ?? null;
  } else {
    plan.headline = row.headline ?? null;
  }
  return plan;
}
