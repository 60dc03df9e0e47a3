import { Suspense, lazy } from 'react';
import type { PlanChartsProps } from './plan-charts';

const PlanCharts = lazy(() => import('./plan-charts'));

/** The plan's charts, loaded on first use. */
export function LazyPlanCharts(props: PlanChartsProps) {
  return (
    <Suspense
      fallback={
        <div role="status" className="h-96 rounded bg-white p-4 text-ink-500 shadow-sm">
          Loading charts…
        </div>
      }
    >
      <PlanCharts {...props} />
    </Suspense>
  );
}
