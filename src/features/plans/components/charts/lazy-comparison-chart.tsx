import { Suspense, lazy } from 'react';
import type { ComparisonChartProps } from './comparison-chart';

const ComparisonChart = lazy(() => import('./comparison-chart'));

export function LazyComparisonChart(props: ComparisonChartProps) {
  return (
    <Suspense
      fallback={
        <div role="status" className="h-72 rounded bg-white p-4 text-ink-500 shadow-sm">
          Loading chart…
        </div>
      }
    >
      <ComparisonChart {...props} />
    </Suspense>
  );
}
