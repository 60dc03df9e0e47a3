/**
 * The demo scenario's plans and horizon study, so a first look at Slackwater
 * shows the work in every state: an approved schedule, the next day's plan
 * awaiting the approver (starting from the approved plan's end SoC), plans of
 * one delivery window with four horizons to compare, and a month-long horizon
 * study. Made the way people make them: through the services, computed by a
 * job worker started here for the purpose, signed off by the demo approver.
 * Idempotent: nothing is added once the demo battery has any plan.
 */
import { planCreateSchema, type PlanCreateInput } from '@shared/schemas/plan';
import { studyCreateSchema } from '@shared/schemas/study';
import { getDb } from '../db/client';
import { loadConfig } from '../config';
import { listBatteries } from '../batteries/batteries.repo';
import { startJobWorker } from '../jobs/job-worker';
import { stopBoss } from '../jobs/boss';
import { configureMail, stopFakeSmtp } from '../mail/mail.service';
import { listProfiles } from '../profiles/profiles.repo';
import { findSiteByName } from '../sites/sites.repo';
import { approvePlan, submitPlan } from '../sign-off/sign-off.service';
import { createStudy, getStudy } from '../studies/studies.service';
import { batteryHasPlans } from '../plans/plans.repo';
import { createPlan, getPlan } from '../plans/plans.service';
import { demoActor } from './demo-accounts';
import { DEMO_BATTERY_NAME, DEMO_SITE_NAME } from './demo-site';

const DEMO_PRICES = 'Day-ahead prices 2026 (hourly)';
const DEMO_LOAD = 'Site load 2026 (hourly)';
const DEMO_GENERATION = 'Rooftop PV 2026 (hourly)';
/** Site time (Europe/Berlin) in late autumn: UTC+1. */
const day = (date: string) => `${date}T00:00:00+01:00`;
const JOB_TIMEOUT_MS = 180_000;

async function settled<T extends { job?: { state: string } | null; errorMessage?: string | null }>(
  read: () => Promise<T>,
  what: string,
): Promise<T> {
  const deadline = Date.now() + JOB_TIMEOUT_MS;
  for (;;) {
    const item = await read();
    if (item.job?.state === 'completed') return item;
    if (item.job?.state === 'failed') throw new Error(`the demo ${what} failed: ${item.errorMessage ?? 'no message'}`);
    if (Date.now() > deadline) throw new Error(`the demo ${what} did not finish within ${JOB_TIMEOUT_MS / 1000} s`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

export async function seedDemoPlans(log: (m: string) => void, databaseUrl: string): Promise<void> {
  const db = getDb();
  const site = await findSiteByName(db, DEMO_SITE_NAME);
  const battery = site && (await listBatteries(db, site.id)).find((b) => b.name === DEMO_BATTERY_NAME);
  if (!site || !battery) throw new Error('the demo plans need the demo site and battery');
  if (await batteryHasPlans(db, battery.id)) {
    log('Demo plans present.');
    return;
  }
  const siteProfiles = await listProfiles(db, site.id);
  const profileId = (name: string) => {
    const found = siteProfiles.find((p) => p.name === name);
    if (!found) throw new Error(`the demo profile "${name}" is missing`);
    return found.id;
  };
  const runSource = {
    batteryId: battery.id,
    priceProfileId: profileId(DEMO_PRICES),
    loadProfileId: profileId(DEMO_LOAD),
    generationProfileId: profileId(DEMO_GENERATION),
  };

  const config = loadConfig({ ...process.env, DATABASE_URL: databaseUrl });
  // Submitting e-mails the approvers (the fake SMTP server keeps it for the outbox page).
  configureMail(config);
  const plannerActor = demoActor('planner', databaseUrl);
  const approverActor = demoActor('approver', databaseUrl);
  const worker = await startJobWorker(databaseUrl);
  try {
    const queuePlan = async (body: Omit<PlanCreateInput, keyof typeof runSource>) =>
      (await createPlan(planCreateSchema.parse({ ...runSource, ...body }), plannerActor, databaseUrl)).plan.id;
    const computed = (id: string) => settled(() => getPlan(id), 'plan');
    // The study runs on its own queue while the plans are made.
    const study = await createStudy(
      studyCreateSchema.parse({
        ...runSource,
        start: day('2026-11-02'),
        end: day('2026-11-30'),
        horizonsHours: [6, 12, 24, 48, 96, 168],
        replanHours: 1,
        terminalRules: ['free', 'steady-value'],
      }),
      plannerActor,
      databaseUrl,
    );

    // Friday's schedule, signed off.
    const approved = await computed(
      await queuePlan({
        deliveryStart: day('2026-12-04'),
        deliveryEnd: day('2026-12-05'),
        horizonHours: 48,
        terminalRule: 'steady-value',
        initialSocPct: 50,
      }),
    );
    const submitted = await submitPlan(plannerActor, approved.id, {
      version: approved.version,
      comment: 'Steady-value end, two days ahead.',
    });
    await approvePlan(approverActor, approved.id, {
      version: submitted.version,
      comment: 'Checked against the site limits and the operator’s instructions.',
    });

    // Saturday's plan starts where the approved one ends, and waits for the approver. Sunday has
    // four horizons side by side: both 24 h plans sell off at night what the 48 h and 168 h plans
    // keep for Monday morning (the one-day steady cycle values energy at midnight too low for that).
    const saturdayId = await queuePlan({
      deliveryStart: day('2026-12-05'),
      deliveryEnd: day('2026-12-06'),
      horizonHours: 48,
      terminalRule: 'steady-value',
    });
    const sunday: [number, 'free' | 'steady-value'][] = [
      [24, 'free'],
      [24, 'steady-value'],
      [48, 'steady-value'],
      [168, 'steady-value'],
    ];
    const sundayIds = await Promise.all(
      sunday.map(([horizonHours, terminalRule]) =>
        queuePlan({ deliveryStart: day('2026-12-06'), deliveryEnd: day('2026-12-07'), horizonHours, terminalRule }),
      ),
    );
    const saturday = await computed(saturdayId);
    await submitPlan(plannerActor, saturday.id, { version: saturday.version, comment: 'Same settings as yesterday.' });
    await Promise.all(sundayIds.map(computed));
    await settled(() => getStudy(study.study.id), 'horizon study');
    log('Demo plans (approved, awaiting sign-off, four horizons of one Sunday) and a horizon study computed.');
  } finally {
    // Nothing may stay open, or the seeding process (npm start, npm test) never exits.
    await worker.stop();
    await stopBoss();
    await stopFakeSmtp();
  }
}
