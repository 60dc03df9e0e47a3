/** Plans: creation (snapshot, validation, job) and reading. */
import type { PlanCreate, PlanCreated, PlanDefaults, PlanInputs, PlanListQuery, Plan } from '@shared/schemas/plan';
import { terminalTargetPct } from '@shared/schemas/terminal-rule';
import { getDb } from '../db/client';
import { notFound } from '../http/app-error';
import { findBattery } from '../batteries/batteries.repo';
import { findSite } from '../sites/sites.repo';
import type { Actor } from '../http/request-context';
import { createRunWithJob, runJob } from '../runs/create-run';
import { checkTerminalTarget, resolveInitialSoc } from '../runs/initial-soc';
import { checkWholeSteps, DEFAULT_BAND_PCT, gridStepMinutes, resolveRunInputs, runColumns } from '../runs/run-inputs';
import { findPlan, insertPlan, listPlans } from './plans.repo';
import { toPlan } from './plan-serializer';

export async function createPlan(body: PlanCreate, actor: Actor, databaseUrl: string): Promise<PlanCreated> {
  const db = getDb();
  const run = await resolveRunInputs(db, {
    batteryId: body.batteryId,
    priceProfileId: body.priceProfileId,
    loadProfileId: body.loadProfileId,
    generationProfileId: body.generationProfileId,
    start: body.deliveryStart,
    end: body.deliveryEnd,
    startField: 'deliveryStart',
    endField: 'deliveryEnd',
    what: 'delivery window',
  });
  checkWholeSteps([{ hours: body.horizonHours, path: 'horizonHours', what: 'horizon' }], gridStepMinutes(run.profiles));
  checkTerminalTarget(run.battery, terminalTargetPct(body.terminalRule), 'terminalRule');
  const soc = await resolveInitialSoc(db, run.battery, body.initialSocPct, body.deliveryStart);
  const inputs: PlanInputs = {
    ...run,
    deliveryStart: body.deliveryStart.toISOString(),
    deliveryEnd: body.deliveryEnd.toISOString(),
    horizonHours: body.horizonHours,
    terminalRule: body.terminalRule,
    initialSocPct: soc.pct,
    initialSocSource: soc.source,
    initialSocPlanId: soc.planId,
    bandPct: DEFAULT_BAND_PCT,
    steadyDays: body.steadyDays ?? 'all',
  };

  const { entityId: planId, jobId } = await createRunWithJob({
    kind: 'plan',
    actor,
    databaseUrl,
    insert: (tx, ids) =>
      insertPlan(tx, {
        id: ids.entityId,
        jobId: ids.jobId,
        ...runColumns(run),
        deliveryStart: body.deliveryStart,
        deliveryEnd: body.deliveryEnd,
        horizonHours: body.horizonHours,
        terminalRule: body.terminalRule,
        initialSocPct: soc.pct,
        inputs,
        createdBy: actor.id,
      }),
    auditDetails: {
      batteryId: run.battery.id,
      deliveryStart: inputs.deliveryStart,
      deliveryEnd: inputs.deliveryEnd,
      horizonHours: body.horizonHours,
      terminalRule: body.terminalRule,
      initialSocPct: soc.pct,
      initialSocSource: soc.source,
      steadyDays: inputs.steadyDays,
    },
  });
  const plan = await getPlan(planId);
  return { plan, job: await runJob(jobId) };
}

export async function getPlan(id: string): Promise<Plan> {
  const row = await findPlan(getDb(), id);
  if (!row) throw notFound('The plan');
  return toPlan(row, true);
}

export async function listPlanSummaries(query: PlanListQuery): Promise<Plan[]> {
  const rows = await listPlans(getDb(), query);
  return rows.map((row) => toPlan(row, false));
}

/** What the plan form proposes for a battery: its start SoC and the site's default horizon. */
export async function planDefaults(batteryId: string, deliveryStart: Date): Promise<PlanDefaults> {
  const db = getDb();
  const battery = await findBattery(db, batteryId);
  if (!battery) throw notFound('The battery');
  const site = await findSite(db, battery.siteId);
  const soc = await resolveInitialSoc(db, { ...battery, maxCyclesPerDay: battery.maxCyclesPerDay }, null, deliveryStart);
  return {
    batteryId,
    initialSocPct: soc.pct,
    initialSocSource: soc.source,
    initialSocPlanId: soc.planId,
    defaultHorizonHours: site?.defaultHorizonHours ?? null,
  };
}
