import { Suspense, lazy } from 'react';
import type { StudyChartsProps } from './study-charts';

const StudyCharts = lazy(() => import('./study-charts'));

export function LazyStudyCharts(props: StudyChartsProps) {
  return (
    <Suspense
      fallback={
        <div role="status" className="h-64 rounded bg-white p-4 text-ink-500 shadow-sm">
          Loading charts…
        </div>
      }
    >
      <StudyCharts {...props} />
    </Suspense>
  );
}
