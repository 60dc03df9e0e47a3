/**
 * The plan page: what was asked, the job's progress while it runs, then the
 * summary, the turnpike figures in words, the charts, the horizon slider, the
 * schedule table and the cautions, with in-page links at the top. The sign-off
 * section is handed in by the route (features do not import each other).
 */
import type { ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { Plan } from '@shared/schemas/plan';
import { steadyDaysLabels } from '@shared/schemas/steady-days';
import { describeTerminalRule } from '@shared/schemas/terminal-rule';
import { ErrorState, LoadingState } from '@/components/query-state';
import { JobProgressBar, isJobActive } from '@/components/job-progress';
import { formatLocalTime, formatNumber } from '@/lib/format';
import { usePlan } from '../api/get-plan';
import { useSiteFlows } from '../api/get-site-flows';
import { Cautions } from './cautions';
import { PlanSummaryCard } from './plan-summary-card';
import { TurnpikePanel } from './turnpike-panel';
import { ScheduleTable } from './schedule-table';
import { LazyPlanCharts } from './charts/lazy-plan-charts';
import { compareUrl } from './compare-url';
import { FactList } from './fact-list';
import { HorizonPreviewSection } from './horizon-preview/horizon-preview-section';
import { PlanSectionsNav, type PlanSection } from './plan-sections-nav';

const socSource: Record<string, string> = {
  'last-approved-plan': 'end SoC of the last approved plan',
  battery: 'battery’s initial SoC',
  request: 'entered',
};

function PlanFacts({ plan }: { plan: Plan }) {
  const tz = plan.inputs?.site.timezone ?? 'UTC';
  const facts: [string, string][] = [
    [
      'Delivery window',
      `${formatLocalTime(Date.parse(plan.deliveryStart), tz)} – ${formatLocalTime(Date.parse(plan.deliveryEnd), tz)}`,
    ],
    ['Horizon', `${plan.horizonHours} h`],
    ['Terminal rule', describeTerminalRule(plan.terminalRule)],
    ['Initial SoC', `${formatNumber(plan.initialSocPct, 1)} % (${socSource[plan.inputs?.initialSocSource ?? 'request'] ?? ''})`],
    ['Steady-cycle days', steadyDaysLabels[plan.inputs?.steadyDays ?? 'all']],
    [
      'Method',
      plan.method === 'dp' ? 'exact dynamic program (fast path)' : plan.method === 'lp' ? 'linear program' : 'not computed yet',
    ],
    ['Status', plan.status],
  ];
  return <FactList rows={facts} />;
}

function sectionsOf(plan: Plan, withSignOff: boolean): PlanSection[] {
  const computed: PlanSection[] = plan.results
    ? [
        { id: 'turnpike-heading', label: 'How far to trust it' },
        { id: 'charts-heading', label: 'Charts' },
        ...(plan.inputs ? [{ id: 'try-horizon-heading', label: 'Try another horizon' }] : []),
        { id: 'schedule-heading', label: 'Schedule' },
      ]
    : [];
  return [
    ...computed,
    { id: 'cautions-heading', label: 'Cautions', tone: 'caution' },
    ...(withSignOff ? [{ id: 'sign-off-heading', label: 'Sign-off' }] : []),
  ];
}

/** The charts, with the site's load and generation read from the plan's profiles. */
function PlanChartsSection({ plan, results }: { plan: Plan; results: NonNullable<Plan['results']> }) {
  const inputs = plan.inputs;
  const flows = useSiteFlows(plan);
  const energyKwh = inputs?.battery.energyKwh ?? 1;
  const usableKwh = inputs ? (energyKwh * (inputs.battery.socMaxPct - inputs.battery.socMinPct)) / 100 : 1;
  return (
    <section aria-labelledby="charts-heading">
      <h2 id="charts-heading" className="sr-only">
        Charts
      </h2>
      <LazyPlanCharts
        results={results}
        timeZone={inputs?.site.timezone ?? 'UTC'}
        currency={inputs?.site.currency ?? ''}
        energyKwh={energyKwh}
        usableKwh={usableKwh}
        load={flows.load}
        generation={flows.generation}
        importLimitKw={inputs?.site.importLimitKw ?? null}
        exportLimitKw={inputs?.site.exportLimitKw ?? null}
      />
    </section>
  );
}

export function PlanPage({ signOff }: { signOff?: (planId: string) => ReactNode }) {
  const { id = '' } = useParams();
  const query = usePlan(id);
  if (query.isPending) return <LoadingState label="Loading the plan…" />;
  if (query.isError)
    return <ErrorState error={query.error} onRetry={() => void query.refetch()} title="The plan could not be loaded." />;
  const plan = query.data;
  const inputs = plan.inputs;
  const tz = inputs?.site.timezone ?? 'UTC';
  const currency = inputs?.site.currency ?? '';
  const energyKwh = inputs?.battery.energyKwh ?? 1;
  return (
    <article className="space-y-6">
      <header className="space-y-3">
        <p className="text-sm text-ink-500">
          <Link to="/plans" className="underline">
            Plans
          </Link>{' '}
          / {plan.siteName}
        </p>
        <h1 className="text-2xl font-semibold text-ink-900">
          Plan for {plan.batteryName ?? 'the battery'} at {plan.siteName ?? 'the site'}
        </h1>
        <PlanFacts plan={plan} />
        <Link to={compareUrl(plan)} className="inline-block text-sm font-semibold text-seaglass-700 underline">
          Compare horizons for this delivery window
        </Link>
      </header>
      <PlanSectionsNav sections={sectionsOf(plan, Boolean(signOff) && !isJobActive(plan.job))} />
      {plan.job && plan.job.state !== 'completed' && <JobProgressBar job={plan.job} label="Computing the plan" />}
      {plan.errorMessage && plan.job?.state === 'failed' && (
        <p role="alert" className="rounded border border-brick-600 bg-brick-100 p-4 text-ink-900">
          {plan.errorMessage}
        </p>
      )}
      {plan.results && (
        <>
          <PlanSummaryCard
            results={plan.results}
            currency={currency}
            energyKwh={energyKwh}
            initialSocPct={plan.initialSocPct}
            socWindow={inputs ? [inputs.battery.socMinPct, inputs.battery.socMaxPct] : null}
          />
          <TurnpikePanel results={plan.results} />
          <PlanChartsSection plan={plan} results={plan.results} />
          {inputs && <HorizonPreviewSection plan={plan} inputs={inputs} results={plan.results} />}
          <section aria-labelledby="schedule-heading" className="space-y-2">
            <h2 id="schedule-heading" className="text-lg font-semibold text-ink-900">
              Schedule
            </h2>
            <ScheduleTable results={plan.results} timeZone={tz} currency={currency} energyKwh={energyKwh} />
          </section>
        </>
      )}
      <Cautions warnings={inputs?.warnings ?? []} />
      {/* What may be done depends on the results (only a computed plan can be submitted): read it once the job settled. */}
      {!isJobActive(plan.job) && signOff?.(plan.id)}
    </article>
  );
}
