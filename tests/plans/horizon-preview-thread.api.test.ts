/**
 * The horizon preview solves on its own worker thread (the API stays
 * responsive while computations run): other requests are answered while a slow
 * preview computes, a preview that fails in the thread is answered with a clear
 * error and the next one works, a full queue is refused with 503 and Retry-After,
 * and a thread that ended is replaced by the next preview. Real jobs.app, real test database.
 */
import { beforeAll, describe, expect, it, vi } from 'vitest';
import type { HorizonPreview } from '@shared/schemas/horizon-preview';
import type { Plan } from '@shared/schemas/plan';
import { getDb } from '../../server/db/client';
import { findPlanForPreview } from '../../server/plans/plans.repo';
import { previewThread } from '../../server/horizon-preview/preview-thread-client';
import { HOUR_MS, iso, sqlRows } from '../support/api-fixtures';
import { computePlan, createPlace, dailyPrices, exactPathBattery, type Place, useJobsTestFile } from '../support/jobs';

const jobs = useJobsTestFile('horizon_preview_thread');

const start = Date.parse('2026-03-02T00:00:00Z');
const battery = exactPathBattery();
let hourly: Place;
let fiveMinute: Place;

async function makePlan(p: Place): Promise<Plan> {
  const plan = await computePlan(jobs.planner, {
    batteryId: p.batteryId,
    priceProfileId: p.priceProfileId,
    deliveryStart: iso(start + 24 * HOUR_MS),
    deliveryEnd: iso(start + 48 * HOUR_MS),
    horizonHours: 24,
    terminalRule: 'steady-value',
    initialSocPct: 50,
  });
  expect(plan.job?.state, plan.errorMessage ?? '').toBe('completed');
  return plan;
}

const preview = (planId: string, horizonHours: number) =>
  jobs.planner.post(`/api/plans/${planId}/horizon-preview`).send({ horizonHours });

/** A job for the thread whose profile values arrive only when the test says: it holds a place in the queue until then. */
function heldJob(key: string, inputs: Awaited<ReturnType<typeof findPlanForPreview>> & object) {
  let release!: (error: Error) => void;
  const gate = new Promise<never>((_, reject) => (release = reject));
  // A preview closed before it asked for its profiles never reads the gate: its rejection is expected, not lost.
  gate.catch(() => undefined);
  const run = previewThread.run({ key, inputs: inputs.inputs, horizonHours: 24, loadSeries: () => gate });
  return {
    run: run.then(
      () => 'answered',
      (error: Error) => error.message,
    ),
    release: () => release(new Error('released by the test')),
  };
}

beforeAll(async () => {
  hourly = await createPlace(jobs.planner, { prices: { values: dailyPrices(4), startMs: start, stepMinutes: 60 }, battery });
  // Ten days of 5-minute prices (invented): a week-long preview is the step cap (2016 steps), the slowest one there is.
  fiveMinute = await createPlace(jobs.planner, {
    prices: { values: dailyPrices(10, 5), startMs: start, stepMinutes: 5 },
    battery,
  });
});

describe('the horizon preview thread', () => {
  it('lets GET /api/health answer while a preview of 5-minute data at the step cap is computing', async () => {
    const plan = await makePlan(fiveMinute);
    const order: string[] = [];
    // The plan's first preview: its profiles are aligned and its steady cycle solved on the thread, then a week is re-planned.
    const slow = preview(plan.id, 168).then((r) => (order.push('preview'), r));
    await vi.waitFor(() => expect(previewThread.pending).toBe(1), { timeout: 10_000, interval: 5 });
    const health = await jobs.planner.get('/api/health');
    order.push('health');
    expect(health.status).toBe(200);
    expect(health.body).toEqual({ ok: true, db: 'up' });
    const answered = await slow;
    expect(answered.status, JSON.stringify(answered.body)).toBe(200);
    // [D] 168 h of 5-minute steps are 168 × 12 = 2016 steps, MAX_PREVIEW_STEPS.
    expect((answered.body as HorizonPreview).steps).toHaveLength(2016);
    // Order, not time: health was answered while the preview still computed.
    expect(order).toEqual(['health', 'preview']);
  });

  it('answers a solve that fails in the thread with a clear 500 JSON error, and the next preview still works', async () => {
    const plan = await makePlan(hourly);
    const before = await preview(plan.id, 36);
    expect(before.status, JSON.stringify(before.body)).toBe(200);
    const broken = await makePlan(hourly);
    const original = (await findPlanForPreview(getDb(), broken.id))!.inputs;
    // A stored snapshot the engine cannot read (no battery): the thread's solve throws, the web process must answer.
    await sqlRows(`update plans set inputs = jsonb_set(inputs, '{battery}', 'null'::jsonb) where id = $1::uuid`, [broken.id]);
    try {
      const failed = await preview(broken.id, 36);
      expect(failed.status).toBe(500);
      expect(failed.headers['content-type']).toMatch(/application\/json/);
      expect(failed.body.error).toMatch(/could not be computed for this plan.*Make a full plan with this horizon instead/);
    } finally {
      await sqlRows(`update plans set inputs = $2::jsonb where id = $1::uuid`, [broken.id, JSON.stringify(original)]);
    }
    const after = await preview(plan.id, 36);
    expect(after.status, JSON.stringify(after.body)).toBe(200);
    // [D] The same plan and horizon on the same engine: the thread that survived gives the same schedule as before.
    expect((after.body as HorizonPreview).cost).toBe((before.body as HorizonPreview).cost);
    expect((after.body as HorizonPreview).steps).toEqual((before.body as HorizonPreview).steps);
  });

  it('refuses a preview with 503 and Retry-After while 8 are pending, and takes previews again once they are answered', async () => {
    const plan = await makePlan(hourly);
    const row = (await findPlanForPreview(getDb(), plan.id))!;
    // Eight previews of snapshots the thread has never seen, each held while its profile values are "read".
    const held = Array.from({ length: 8 }, (_, i) => heldJob(`held-${i}:${plan.id}`, row));
    expect(previewThread.pending).toBe(8);
    const refused = await preview(plan.id, 30);
    expect(refused.status, JSON.stringify(refused.body)).toBe(503);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThanOrEqual(1);
    expect(refused.body.error).toMatch(/The preview is busy: 8 previews.*Wait a second and move the slider again/);
    held.forEach((h) => h.release());
    expect(await Promise.all(held.map((h) => h.run))).toEqual(Array(8).fill('released by the test'));
    expect(previewThread.pending).toBe(0);
    const taken = await preview(plan.id, 30);
    expect(taken.status, JSON.stringify(taken.body)).toBe(200);
    expect((taken.body as HorizonPreview).steps).toHaveLength(30);
  });

  it('answers the previews a closing thread held with 503, and starts a new thread for the next preview', async () => {
    const plan = await makePlan(hourly);
    const row = (await findPlanForPreview(getDb(), plan.id))!;
    const first = await preview(plan.id, 48);
    expect(first.status, JSON.stringify(first.body)).toBe(200);
    // Closed right after the request went out (no turn of the event loop between): the thread still holds it.
    const held = heldJob(`closing:${plan.id}`, row);
    await previewThread.close();
    held.release();
    expect(await held.run).toMatch(/The horizon preview stopped while computing\. Move the slider again/);
    expect(previewThread.pending).toBe(0);
    const again = await preview(plan.id, 48);
    expect(again.status, JSON.stringify(again.body)).toBe(200);
    // [D] A new thread has no cache: it aligns the profiles and solves the steady cycle again, to the same schedule.
    expect((again.body as HorizonPreview).steps).toEqual((first.body as HorizonPreview).steps);
  });
});
