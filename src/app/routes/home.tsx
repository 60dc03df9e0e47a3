/**
 * The home page: what needs attention now. Running and failed background jobs,
 * plans waiting for sign-off (for approvers: the ones they may sign), and
 * draft plans whose turnpike figures raised flags.
 */
import { Link } from 'react-router-dom';
import { useCan } from '@/lib/authorization';
import { FlaggedPlans, PlansAwaitingSignOff, RunningJobs } from '@/features/plans/components/attention';
import { PendingSignOffList } from '@/features/sign-off/components/pending-sign-off-list';

export function HomeRoute() {
  const canPlan = useCan('data.edit');
  const canApprove = useCan('plans.approve');
  return (
    <section className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-3xl font-semibold text-ink-900">Needs attention</h1>
          <p className="max-w-2xl text-ink-700">
            Background jobs, plans waiting for a second person, and plans whose figures say “look again”.
          </p>
        </div>
        {canPlan && (
          <div className="flex gap-2">
            <Link
              to="/plans/new"
              className="rounded bg-seaglass-700 px-4 py-2 text-sm font-semibold text-white hover:bg-seaglass-800"
            >
              New plan
            </Link>
            <Link
              to="/studies/new"
              className="rounded border border-ink-300 bg-white px-4 py-2 text-sm font-medium text-ink-800 hover:bg-ink-50"
            >
              New horizon study
            </Link>
          </div>
        )}
      </div>
      <RunningJobs />
      {canApprove ? (
        <section className="space-y-3 rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
          <h2 className="text-lg font-semibold text-ink-900">Awaiting your sign-off</h2>
          <PendingSignOffList />
        </section>
      ) : (
        <PlansAwaitingSignOff />
      )}
      <FlaggedPlans />
    </section>
  );
}
