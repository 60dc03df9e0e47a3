/**
 * "Try another horizon" on the plan page: a slider re-plans the plan's
 * own inputs with another horizon on the exact fast path, a fraction of a
 * second per move, and shows the SoC against the plan's, the cost difference
 * and the decision horizon. Models the fast path cannot take say why instead.
 */
import { Suspense, lazy, useState } from 'react';
import { Link } from 'react-router-dom';
import { horizonPreviewLimits } from '@shared/schemas/horizon-preview';
import type { Plan, PlanInputs, PlanResults } from '@shared/schemas/plan';
import { ApiError } from '@/lib/api-client';
import { useCan } from '@/lib/authorization';
import { formatNumber } from '@/lib/format';
import { isPreviewUnavailable, useHorizonPreview } from '../../api/preview-horizon';
import { useDebouncedValue } from '../../hooks/use-debounced-value';
import { newPlanUrl } from '../new-plan-prefill';
import { HorizonControls, type HorizonRange } from './horizon-controls';
import { PreviewFigures } from './preview-figures';
import { PreviewSocTable } from './preview-soc-table';

const PreviewSocChart = lazy(() => import('./preview-soc-chart'));

/** The slider spans a week unless the plan's own horizon is longer; typing goes to the preview's limit. */
const SLIDER_SPAN_HOURS = 168;
const DEBOUNCE_MS = 150;

function rangeFor(plan: Plan, inputs: PlanInputs): HorizonRange {
  const limits = horizonPreviewLimits(inputs);
  const sliderMax = Math.max(limits.minHours, Math.min(limits.maxHours, Math.max(SLIDER_SPAN_HOURS, plan.horizonHours)));
  // Whole hours on the slider when the profiles' step divides an hour (5, 15, 30, 60 minutes).
  const sliderStep = limits.stepHours <= 1 && Number.isInteger(1 / limits.stepHours) ? 1 : limits.stepHours;
  return {
    min: limits.minHours,
    sliderMax,
    sliderStep,
    maxHours: Math.max(limits.minHours, limits.maxHours),
    stepHours: limits.stepHours,
  };
}

export function HorizonPreviewSection({ plan, inputs, results }: { plan: Plan; inputs: PlanInputs; results: PlanResults }) {
  const range = rangeFor(plan, inputs);
  const [hours, setHours] = useState(() => Math.min(Math.max(plan.horizonHours, range.min), range.maxHours));
  const settled = useDebouncedValue(hours, DEBOUNCE_MS);
  const query = useHorizonPreview(plan.id, settled);
  const canEdit = useCan('data.edit');
  const tz = inputs.site.timezone;
  const unavailable = isPreviewUnavailable(query.error) ? query.error : null;
  const preview = query.data;
  const busy = hours !== settled || query.isFetching;

  return (
    <section aria-labelledby="try-horizon-heading" className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="try-horizon-heading" className="text-lg font-semibold text-ink-900">
        Try another horizon
      </h2>
      {unavailable ? (
        <div className="space-y-2">
          <p role="note" className="rounded bg-amber-100 p-3 text-sm text-ink-900">
            {unavailable.message}
          </p>
          {canEdit && (
            <Link
              to={newPlanUrl(plan, plan.horizonHours)}
              className="inline-block text-sm font-semibold text-seaglass-700 underline"
            >
              Open the plan form with this plan’s inputs
            </Link>
          )}
        </div>
      ) : (
        <>
          <p className="text-sm text-ink-700">
            Re-plans this plan’s inputs (battery, profiles, window, terminal rule, initial SoC) with another horizon on the exact
            fast path. Nothing is saved; make a plan with a horizon you like.
          </p>
          <HorizonControls hours={hours} range={range} onChange={setHours} />
          <p role="status" aria-live="polite" className="text-sm text-ink-500">
            {busy
              ? `Re-planning with ${formatNumber(hours, 2)} h…`
              : preview
                ? `Re-planned with ${formatNumber(preview.horizonHours, 2)} h in ${formatNumber(preview.computeMs, 1)} ms.`
                : ''}
          </p>
          {query.isError && (
            <p role="alert" className="rounded border border-brick-600 bg-brick-100 p-3 text-sm text-ink-900">
              The preview could not be made:{' '}
              {query.error instanceof ApiError ? (query.error.issues[0]?.message ?? query.error.message) : String(query.error)}
            </p>
          )}
          {preview && !query.isError && (
            <>
              <PreviewFigures
                preview={preview}
                planHorizonHours={plan.horizonHours}
                currency={inputs.site.currency}
                makePlanUrl={canEdit ? newPlanUrl(plan, preview.horizonHours) : null}
              />
              <Suspense
                fallback={
                  <div role="status" className="h-72 rounded bg-white p-4 text-ink-500 shadow-sm">
                    Loading the chart…
                  </div>
                }
              >
                <PreviewSocChart results={results} planHorizonHours={plan.horizonHours} preview={preview} timeZone={tz} />
              </Suspense>
              <PreviewSocTable results={results} preview={preview} timeZone={tz} />
            </>
          )}
        </>
      )}
    </section>
  );
}
