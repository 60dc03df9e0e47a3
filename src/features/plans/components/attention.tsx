/**
 * What needs attention, for the home page: background jobs running or failed
 * lately, plans submitted and waiting for sign-off, and computed drafts whose
 * turnpike figures raised flags.
 */
import { Link } from 'react-router-dom';
import { JobProgressBar } from '@/components/job-progress';
import { ErrorState, LoadingState } from '@/components/query-state';
import { useJobs } from '../api/get-jobs';
import { usePlans } from '../api/get-plans';
import { PlansTable } from './plans-table';

function Panel({ title, children, count }: { title: string; count?: number | undefined; children: React.ReactNode }) {
  return (
    <section className="space-y-3 rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
      <h2 className="text-lg font-semibold text-ink-900">
        {title} {count !== undefined && <span className="ml-1 rounded-full bg-ink-100 px-2 text-sm text-ink-700">{count}</span>}
      </h2>
      {children}
    </section>
  );
}

const entityUrl = (kind: string, id: string) => (kind === 'plan' ? `/plans/${id}` : `/studies/${id}`);

export function RunningJobs() {
  const active = useJobs('active');
  const failed = useJobs('failed');
  return (
    <Panel title="Running jobs" count={active.data?.length}>
      {active.isPending && <LoadingState />}
      {active.isError && <ErrorState error={active.error} />}
      {active.data?.length === 0 && <p className="text-sm text-ink-500">Nothing is being computed right now.</p>}
      {active.data?.map((job) => (
        <Link key={job.id} to={entityUrl(job.kind, job.entityId)} className="block rounded p-1 hover:bg-ink-50">
          <JobProgressBar job={job} label={job.label} />
        </Link>
      ))}
      {(failed.data ?? []).slice(0, 5).map((job) => (
        <p key={job.id} className="text-sm">
          <Link to={entityUrl(job.kind, job.entityId)} className="font-semibold text-brick-700 underline">
            Failed: {job.label}
          </Link>
          <span className="block text-ink-700">{job.error}</span>
        </p>
      ))}
    </Panel>
  );
}

export function PlansAwaitingSignOff() {
  const plans = usePlans({ status: 'submitted', limit: 20 });
  return (
    <Panel title="Plans awaiting sign-off" count={plans.data?.length}>
      {plans.data?.length === 0 && <p className="text-sm text-ink-500">No plan is waiting.</p>}
      {plans.data && plans.data.length > 0 && <PlansTable plans={plans.data} />}
    </Panel>
  );
}

export function FlaggedPlans() {
  const plans = usePlans({ status: 'draft', flagged: 'true', limit: 10 });
  return (
    <Panel title="Draft plans with flags" count={plans.data?.length}>
      {plans.data?.length === 0 && <p className="text-sm text-ink-500">No draft plan raised a flag.</p>}
      {plans.data && plans.data.length > 0 && <PlansTable plans={plans.data} />}
    </Panel>
  );
}
