import { Suspense, lazy } from 'react';
import type { SeriesChartProps } from './series-chart';

const SeriesChart = lazy(() => import('./series-chart'));

/** The chart, loaded on first use; a placeholder of the same height meanwhile. */
export function LazySeriesChart(props: SeriesChartProps) {
  return (
    <Suspense
      fallback={
        <div role="status" className="rounded bg-white p-4 text-ink-500 shadow-sm" style={{ height: (props.height ?? 260) + 16 }}>
          Loading chart…
        </div>
      }
    >
      <SeriesChart {...props} />
    </Suspense>
  );
}
