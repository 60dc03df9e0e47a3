/**
 * The plan job: load the snapshot's profiles, solve in a worker thread, store
 * the results once (keyed by plan id and input version) together with the
 * job's final state and an audit event. Runs again harmlessly after a crash.
 */
import type { PlanResults } from '@shared/schemas/plan';
import { getDb } from '../db/client';
import { queues } from '../jobs/boss';
import { finishJob } from '../jobs/job-progress.repo';
import { runInThread } from '../jobs/run-in-thread';
import { storeResultsOnce } from '../jobs/store-results';
import { JobFailure, type JobHandler } from '../jobs/job-types';
import type { ComputeOutcome, PlanComputeInput } from './plan-compute';
import { loadSnapshotProfiles } from './profile-series';
import { findPlan, recordPlanError, storePlanResults } from './plans.repo';

export const planJobHandler: JobHandler = {
  kind: 'plan',
  queue: queues.plan,

  async run(ctx, data) {
    const db = getDb();
    const row = await findPlan(db, data.entityId);
    if (!row) throw new JobFailure('The plan no longer exists.');
    const plan = row.plan;
    if (plan.inputVersion !== data.inputVersion)
      throw new JobFailure('The plan’s inputs changed after this job was queued; a newer job computes them.');

    if (plan.results === null) {
      ctx.report(0.02, 'Reading the profiles.', true);
      const profiles = await loadSnapshotProfiles(db, plan.inputs.profiles);
      const input: PlanComputeInput = { inputs: plan.inputs, ...profiles };
      const outcome = await runInThread<ComputeOutcome<PlanResults>>(
        { task: 'plan', input },
        { signal: ctx.signal, onProgress: (share, message) => ctx.report(0.05 + 0.9 * share, message) },
      );
      if (!outcome.ok) throw new JobFailure(`The plan could not be computed: ${outcome.message}`);
      await storeResultsOnce(ctx, data, {
        label: 'The plan',
        method: outcome.results.method,
        store: (tx) => storePlanResults(tx, plan.id, data.inputVersion, outcome.results),
      });
      return;
    }
    // Stored by an earlier attempt that died before finishing its job: just finish it.
    await finishJob(db, data.jobId, ctx.attempt, { state: 'completed', message: 'The plan was already computed.' });
  },

  recordFailure: (db, data, message) => recordPlanError(db, data.entityId, message),
};
