/**
 * Plans of one battery and delivery window side by side, by horizon and
 * terminal rule: a table of cost and turnpike figures, and their SoC curves
 * overlaid, so the planner sees where longer horizons stop changing the schedule.
 */
import { useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { JobProgressBar } from '@/components/job-progress';
import { formatLocalTime } from '@/lib/format';
import { usePlans } from '../api/get-plans';
import { usePlanDetails } from '../api/get-plan-details';
import { CompareHorizonsForm } from './compare-horizons-form';
import { ComparisonTable } from './comparison-table';
import { LazyComparisonChart } from './charts/lazy-comparison-chart';

export function ComparePage() {
  const [params] = useSearchParams();
  const filters = {
    batteryId: params.get('batteryId') ?? undefined,
    deliveryStart: params.get('deliveryStart') ?? undefined,
    deliveryEnd: params.get('deliveryEnd') ?? undefined,
    limit: 50,
  };
  const list = usePlans(filters);
  const ids = (list.data ?? []).map((p) => p.id);
  const details = usePlanDetails(ids);
  if (!filters.batteryId || !filters.deliveryStart || !filters.deliveryEnd) {
    return (
      <EmptyState title="Open the comparison from a plan page">
        It compares plans of one battery for one delivery window.
      </EmptyState>
    );
  }
  if (list.isPending) return <LoadingState label="Loading the plans…" />;
  if (list.isError) return <ErrorState error={list.error} onRetry={() => void list.refetch()} />;
  const plans = details
    .map((d) => d.data)
    .filter((p) => p !== undefined)
    .sort((a, b) => a.horizonHours - b.horizonHours || a.terminalRule.localeCompare(b.terminalRule));
  const base = plans[0];
  const tz = base?.inputs?.site.timezone ?? 'UTC';
  return (
    <article className="space-y-5">
      <header>
        <h1 className="text-2xl font-semibold text-ink-900">Compare horizons</h1>
        <p className="text-ink-700">
          {base ? `${base.batteryName} at ${base.siteName}, ` : ''}
          delivery {formatLocalTime(Date.parse(filters.deliveryStart), tz)} –{' '}
          {formatLocalTime(Date.parse(filters.deliveryEnd), tz)}
        </p>
      </header>
      {base && <CompareHorizonsForm base={base} existing={plans} />}
      {plans
        .filter((p) => p.job && p.job.state !== 'completed')
        .map((p) => (
          <JobProgressBar key={p.id} job={p.job!} label={`${p.horizonHours} h, ${p.terminalRule}`} />
        ))}
      {plans.length === 0 ? <EmptyState title="No plans for this window yet" /> : <ComparisonTable plans={plans} />}
      {plans.some((p) => p.results) && <LazyComparisonChart plans={plans.filter((p) => p.results)} timeZone={tz} />}
    </article>
  );
}
