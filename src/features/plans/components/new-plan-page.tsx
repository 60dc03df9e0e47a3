import { useSearchParams } from 'react-router-dom';
import { useCan } from '@/lib/authorization';
import { NotForRole } from '@/components/not-for-role';
import { PlanForm } from './plan-form';
import { prefillFromSearch } from './new-plan-prefill';

/** `/plans/new?siteId=&batteryId=&…` (new-plan-prefill.ts): the plan form, preset from the page that linked here. */
export function NewPlanPage() {
  const [params] = useSearchParams();
  const canEdit = useCan('data.edit');
  if (!canEdit) return <NotForRole title="New plan">Your role can read plans but not start them; ask a planner.</NotForRole>;
  return (
    <section className="max-w-4xl space-y-4">
      <h1 className="text-2xl font-semibold text-ink-900">New plan</h1>
      <p className="text-ink-700">
        The plan is computed in the background; its page shows the progress and then the schedule, how long it stays near the
        steady cycle, and what is safe to commit.
      </p>
      <PlanForm initial={prefillFromSearch(params)} />
    </section>
  );
}
