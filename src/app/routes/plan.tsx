import { PlanPage } from '@/features/plans/components/plan-page';
import { SignOffPanel } from '@/features/sign-off/components/sign-off-panel';

/** `/plans/:id`: the plan page with its sign-off section (two features composed here). */
export function PlanRoute() {
  return <PlanPage signOff={(planId) => <SignOffPanel planId={planId} />} />;
}
