/**
 * Which sign-off action may go ahead on a plan as it is now, and the clearest
 * reason when not: segregation of duties first (who), then the state, the
 * version the user looked at, and whether there is a schedule to sign off.
 */
import { AppError, forbidden, unprocessable } from '../http/app-error';
import type { PlanRow } from '../plans/plans.schema';

export type Step = 'submitted' | 'approved' | 'rejected';

export const VERB: Record<Step, string> = { submitted: 'submit', approved: 'approve', rejected: 'reject' };
const NEEDS: Record<Step, PlanRow['status']> = { submitted: 'draft', approved: 'submitted', rejected: 'submitted' };

/** The clearest reason an action cannot go ahead on `plan` as it is now, or null. */
export function refusal(plan: PlanRow, step: Step, version: number, userId: string): AppError | null {
  if (step !== 'submitted' && plan.submittedBy === userId) {
    // Segregation of duties (ASVS 4.0.3 4.3.3): the database CHECK says the same.
    return forbidden(`You submitted this plan, so you cannot ${VERB[step]} it: another approver must sign it off.`);
  }
  if (plan.status !== NEEDS[step]) {
    return new AppError(
      'wrong_status',
      `The plan is ${plan.status}; only a ${NEEDS[step]} plan can be ${step}. Reload the plan to see who acted on it.`,
      409,
    );
  }
  if (plan.version !== version) {
    return new AppError(
      'stale_version',
      `The plan changed since you opened it (you sent version ${version}, it is now at version ${plan.version}). Reload it, check it again and retry.`,
      409,
    );
  }
  if (plan.results === null) {
    return unprocessable(
      plan.errorMessage
        ? `The plan has no results to sign off: ${plan.errorMessage}`
        : 'The plan has no results yet: wait for its job to finish.',
    );
  }
  return null;
}
