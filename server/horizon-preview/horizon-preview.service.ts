/**
 * The quick horizon preview (issue 9): a plan's stored inputs re-solved with
 * another horizon, on the exact fast path, answered at once. Read-only: the
 * plan, its job and the audit trail stay as they are; a planner who likes the
 * horizon makes a full plan with it.
 */
import { horizonPreviewLimits, MAX_PREVIEW_STEPS, type HorizonPreview, type HorizonPreviewLimits, type HorizonPreviewRequest } from '@shared/schemas/horizon-preview';
import { getDb } from '../db/client';
import { AppError, notFound, unprocessable } from '../http/app-error';
import { checkWholeSteps } from '../plans/run-inputs';
import { findPlanForPreview } from './horizon-preview.repo';
import { previewSource, steadyOf } from './preview-inputs';
import { previewEligibility, solvePreview } from './preview-solve';

const hours = (h: number) => `${Number(h.toFixed(4))} h`;

function checkRange(horizonHours: number, limits: HorizonPreviewLimits, dataEnd: string): void {
  const path = 'horizonHours';
  if (horizonHours < limits.minHours - 1e-9) {
    throw unprocessable('The horizon cannot be previewed: see issues.', [
      { path, message: `The horizon (${hours(horizonHours)}) is shorter than the delivery window (${hours(limits.minHours)}): it must at least cover the window. Choose ${hours(limits.minHours)} or more.` },
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

/** Why the preview cannot run, in the planner's words, with what to do instead. */
function needsExactPath(reason: string): AppError {
  const why = reason.replace(/; the LP path solves it$/, '');
  return new AppError(
    'preview_needs_exact_path',
    `The quick horizon preview needs the exact fast path, and this plan’s model is one it cannot solve exactly: ${why}. ` +
      'Make a full plan with the horizon you want instead: it runs in the background on the linear program.',
    422,
    [{ path: 'model', message: why }],
    { previewAvailable: false },
  );
}

export async function previewHorizon(planId: string, body: HorizonPreviewRequest): Promise<HorizonPreview> {
  const started = performance.now();
  const row = await findPlanForPreview(getDb(), planId);
  if (!row) throw notFound('The plan');
  const { inputs } = row;
  const limits = horizonPreviewLimits(inputs);
  checkWholeSteps([{ hours: body.horizonHours, path: 'horizonHours', what: 'horizon' }], limits.stepHours * 60);
  const dataEnd = [inputs.profiles.price, inputs.profiles.load, inputs.profiles.generation].filter((p) => p !== null).map((p) => p.end).sort()[0] ?? '';
  checkRange(body.horizonHours, limits, dataEnd);

  const source = await previewSource(row.id, row.inputVersion, inputs);
  const eligible = previewEligibility(source.aligned, inputs, body.horizonHours);
  if (!eligible.ok) throw needsExactPath(eligible.reason);
  const outcome = solvePreview(source.aligned, steadyOf(source), inputs, body.horizonHours);
  if (!outcome.ok) throw unprocessable(`The plan cannot be solved with a horizon of ${hours(body.horizonHours)}: ${outcome.message}.`);
  const { preview } = outcome;
  return {
    planId: row.id,
    ...preview,
    planCost: row.planCost,
    costDifference: row.planCost === null ? null : preview.cost - row.planCost,
    limits,
    serverMs: performance.now() - started,
  };
}
