/**
 * The quick horizon preview: a plan's stored inputs re-solved with
 * another horizon, on the exact fast path, answered at once. Read-only: the
 * plan, its job and the audit trail stay as they are; a planner who likes the
 * horizon makes a full plan with it.
 */
import {
  horizonPreviewLimits,
  MAX_PREVIEW_STEPS,
  type HorizonPreview,
  type HorizonPreviewLimits,
  type HorizonPreviewRequest,
} from '@shared/schemas/horizon-preview';
import { getDb } from '../db/client';
import { notFound, unprocessable } from '../http/app-error';
import { checkWholeSteps } from '../runs/run-inputs';
import { findPlanForPreview } from '../plans/plans.repo';
import { loadPreviewSeries } from './preview-inputs';
import { hours } from './preview-solve';
import { previewThread } from './preview-thread-client';

function checkRange(horizonHours: number, limits: HorizonPreviewLimits, dataEnd: string): void {
  const path = 'horizonHours';
  if (horizonHours < limits.minHours - 1e-9) {
    throw unprocessable('The horizon cannot be previewed: see issues.', [
      {
        path,
        message: `The horizon (${hours(horizonHours)}) is shorter than the delivery window (${hours(limits.minHours)}): it must at least cover the window. Choose ${hours(limits.minHours)} or more.`,
      },
    ]);
  }
  if (horizonHours > limits.maxHours + 1e-9) {
    const why = {
      data: `the profiles end at ${dataEnd}, ${hours(limits.maxHours)} after the delivery start, and the preview looks no further than the data`,
      year: 'no plan looks further ahead than one leap year',
      steps: `a quick preview solves at most ${MAX_PREVIEW_STEPS} steps of ${hours(limits.stepHours)}; for a longer horizon make a full plan, which runs in the background`,
    }[limits.maxReason];
    throw unprocessable('The horizon cannot be previewed: see issues.', [
      { path, message: `The horizon (${hours(horizonHours)}) is too long: ${why}. Choose ${hours(limits.maxHours)} or less.` },
    ]);
  }
}

export async function previewHorizon(planId: string, body: HorizonPreviewRequest): Promise<HorizonPreview> {
  const started = performance.now();
  const row = await findPlanForPreview(getDb(), planId);
  if (!row) throw notFound('The plan');
  const { inputs } = row;
  const limits = horizonPreviewLimits(inputs);
  checkWholeSteps([{ hours: body.horizonHours, path: 'horizonHours', what: 'horizon' }], limits.stepHours * 60);
  const dataEnd =
    [inputs.profiles.price, inputs.profiles.load, inputs.profiles.generation]
      .filter((p) => p !== null)
      .map((p) => p.end)
      .sort()[0] ?? '';
  checkRange(body.horizonHours, limits, dataEnd);

  // The solve runs on the preview thread: the event loop stays free for every other request meanwhile.
  const key = `${row.id}:${row.inputVersion}`;
  const preview = await previewThread.run({
    key,
    inputs,
    horizonHours: body.horizonHours,
    loadSeries: () => loadPreviewSeries(key, inputs),
  });
  return {
    planId: row.id,
    ...preview,
    planCost: row.planCost,
    costDifference: row.planCost === null ? null : preview.cost - row.planCost,
    planNetCost: row.planNetCost,
    netCostDifference: row.planNetCost === null ? null : preview.netCost - row.planNetCost,
    limits,
    serverMs: performance.now() - started,
  };
}
