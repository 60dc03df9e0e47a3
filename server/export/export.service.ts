/**
 * `GET /api/plans/:id/export.csv`: the schedule of the delivery window as CSV.
 * Viewers get approved plans only. A signed-off plan's checksum is recomputed
 * from the stored inputs and results before a single byte is sent: a plan
 * that no longer matches what was approved is never served (README, "Sign-off
 * and exports").
 */
import type { PlanResults, PlanStep } from '@shared/schemas/plan';
import { SIGN_OFF_CAUTIONS } from '@shared/schemas/sign-off';
import { getDb } from '../db/client';
import { AppError, forbidden, notFound } from '../http/app-error';
import { logger } from '../logger';
import { recordAudit } from '../audit/audit.service';
import type { Actor } from '../http/request-context';
import type { PlanRow } from '../plans/plans.schema';
import { checksumMatches } from '../sign-off/plan-checksum';
import { exportFileName } from './export-file-name';
import { findPlanRow } from '../plans/plans.repo';
import { findPeople } from '../users/users.repo';
import { ExportDataError, planCsv, type ExportSchedule } from './plan-csv';

export interface PlanExport {
  fileName: string;
  csv: string;
  status: PlanRow['status'];
  /** Only for signed-off plans, after it was verified. */
  checksum: string | null;
}

function deliverySteps(results: PlanResults): PlanStep[] {
  const steps = results.steps.filter((s) => s.delivery);
  if (steps.length !== results.deliverySteps) {
    throw new ExportDataError(
      `The plan's results hold ${steps.length} delivery steps where ${results.deliverySteps} were expected.`,
    );
  }
  return steps;
}

function scheduleOf(plan: PlanRow, results: PlanResults): ExportSchedule {
  const steps = deliverySteps(results);
  const first = steps[0];
  const startMs = first ? Date.parse(first.time) : plan.deliveryStart.getTime();
  if (startMs !== plan.deliveryStart.getTime())
    throw new ExportDataError("The plan's first delivery step does not start at the delivery window's start.");
  return {
    timezone: plan.inputs.site.timezone,
    currency: plan.inputs.site.currency,
    startMs,
    stepMinutes: results.stepMinutes,
    energyKwh: plan.inputs.battery.energyKwh,
    priceCurrencyPerMwh: steps.map((s) => s.priceImport),
    chargeKw: steps.map((s) => s.chargeKw),
    dischargeKw: steps.map((s) => s.dischargeKw),
    socEndKwh: steps.map((s) => s.socKwh),
    gridImportKw: steps.map((s) => s.gridImportKw),
    gridExportKw: steps.map((s) => s.gridExportKw),
    storedEnergyValue: steps.map((s) => s.storedEnergyValue),
  };
}

function notice(status: PlanRow['status']): string {
  const head =
    status === 'approved'
      ? 'Approved plan.'
      : status === 'superseded'
        ? 'SUPERSEDED: a newer approved plan replaces this one; do not dispatch it.'
        : `NOT APPROVED (${status}): this schedule has not been signed off; do not dispatch it.`;
  return [head, ...SIGN_OFF_CAUTIONS].join(' ');
}

export async function exportPlan(actor: Actor, id: string): Promise<PlanExport> {
  const db = getDb();
  const plan = await findPlanRow(db, id);
  if (!plan) throw notFound('The plan');
  if (actor.role === 'viewer' && plan.status !== 'approved') {
    throw forbidden(`Viewers may export approved plans only; this plan is ${plan.status}.`);
  }
  if (plan.results === null) {
    throw new AppError(
      'no_results',
      plan.errorMessage
        ? `The plan has no schedule to export: ${plan.errorMessage}`
        : 'The plan has no schedule yet: wait for its job to finish.',
      409,
    );
  }
  const signedOff = plan.status === 'approved' || plan.status === 'superseded';
  if (signedOff && !checksumMatches(plan.checksum, { planId: plan.id, inputs: plan.inputs, results: plan.results })) {
    logger.error(`Checksum mismatch on export of plan ${plan.id}: its stored inputs or results changed after approval`);
    await recordAudit(db, actor, {
      action: 'plan.checksum_mismatch',
      entityType: 'plan',
      entityId: plan.id,
      details: { stored: plan.checksum },
    });
    throw new AppError(
      'checksum_mismatch',
      'This plan no longer matches the checksum taken when it was approved, so it is not exported. Its stored data was changed outside Slackwater; an administrator must restore it from a backup.',
      500,
    );
  }
  const people = await findPeople(db, plan.approvedBy ? [plan.approvedBy] : []);
  let csv: string;
  try {
    csv = planCsv(scheduleOf(plan, plan.results), {
      siteName: plan.inputs.site.name,
      planId: plan.id,
      status: plan.status,
      approvedBy: plan.approvedBy ? (people.get(plan.approvedBy)?.name ?? plan.approvedBy) : null,
      approvedAt: plan.approvedAt?.toISOString() ?? null,
      approvalComment: plan.approvalComment,
      checksum: signedOff ? plan.checksum : null,
      notice: notice(plan.status),
      batteryName: plan.inputs.battery.name,
      batteryVersion: plan.inputs.battery.version,
      deliveryStart: plan.deliveryStart.toISOString(),
      deliveryEnd: plan.deliveryEnd.toISOString(),
      horizonHours: plan.horizonHours,
      terminalRule: plan.terminalRule,
      exportedAt: new Date().toISOString(),
    });
  } catch (error) {
    if (error instanceof ExportDataError)
      throw new AppError('export_failed', `The plan cannot be exported: ${error.message}`, 500);
    throw error;
  }
  const fileName = exportFileName({
    siteName: plan.inputs.site.name,
    timezone: plan.inputs.site.timezone,
    startMs: plan.deliveryStart.getTime(),
    endMs: plan.deliveryEnd.getTime(),
    planId: plan.id,
    status: plan.status,
    checksum: signedOff ? plan.checksum : null,
  });
  await recordAudit(db, actor, {
    action: 'plan.exported',
    entityType: 'plan',
    entityId: plan.id,
    details: { status: plan.status, checksum: signedOff ? plan.checksum : null, fileName },
  });
  return { fileName, csv, status: plan.status, checksum: signedOff ? plan.checksum : null };
}
