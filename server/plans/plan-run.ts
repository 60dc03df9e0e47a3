/** What the run kernel needs to compute a plan in the background (server/runs/run-job-handler.ts). */
import type { PlanInputs, PlanResults } from '@shared/schemas/plan';
import type { RunKind } from '../runs/run-kind';
import { findPlan, findPlanSubjects, recordPlanError, storePlanResults } from './plans.repo';
import { planTask, type PlanComputeInput } from './plan-task';

export const planRun: RunKind<PlanInputs, PlanComputeInput, PlanResults> = {
  kind: 'plan',
  queue: 'plan-solve',
  task: planTask,
  words: {
    the: 'The plan',
    listed: 'Plan',
    gone: 'The plan no longer exists.',
    inputsChanged: 'The plan’s inputs changed after this job was queued; a newer job computes them.',
  },
  progress: { reading: 0.02, scale: (share) => 0.05 + 0.9 * share },
  async load(db, id) {
    const row = await findPlan(db, id);
    if (!row) return undefined;
    const { plan } = row;
    return { id: plan.id, inputVersion: plan.inputVersion, inputs: plan.inputs, computed: plan.results !== null };
  },
  input: (snapshot, series) => ({ inputs: snapshot.inputs, ...series }),
  store: storePlanResults,
  recordFailure: recordPlanError,
  subjects: findPlanSubjects,
};
