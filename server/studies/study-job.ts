/**
 * The horizon-study job: load the snapshot's profiles, run the study in a
 * worker thread with progress after every closed-loop run, and store the
 * results once (keyed by study id and input version) together with the job's
 * final state and an audit event. Safe to run again after a crash.
 */
import type { StudyResults } from '@shared/schemas/study';
import { getDb } from '../db/client';
import { queues } from '../jobs/boss';
import { finishJob } from '../jobs/job-progress.repo';
import { runInThread } from '../jobs/run-in-thread';
import { storeResultsOnce } from '../jobs/store-results';
import { loadJobsConfig } from '../jobs/jobs-config';
import { JobFailure, type JobHandler } from '../jobs/job-types';
import type { ComputeOutcome } from '../plans/plan-compute';
import { loadSnapshotProfiles } from '../plans/profile-series';
import type { StudyComputeInput } from './study-compute';
import { findStudy, recordStudyError, storeStudyResults } from './studies.repo';

export const studyJobHandler: JobHandler = {
  kind: 'study',
  queue: queues.study,

  async run(ctx, data) {
    const db = getDb();
    const row = await findStudy(db, data.entityId);
    if (!row) throw new JobFailure('The horizon study no longer exists.');
    const study = row.study;
    if (study.inputVersion !== data.inputVersion) throw new JobFailure('The study’s inputs changed after this job was queued.');
    if (study.results !== null) {
      await finishJob(db, data.jobId, ctx.attempt, { state: 'completed', message: 'The study was already computed.' });
      return;
    }
    ctx.report(0.01, 'Reading the profiles.', true);
    const profiles = await loadSnapshotProfiles(db, study.inputs.profiles);
    const input: StudyComputeInput = { inputs: study.inputs, ...profiles, threads: loadJobsConfig().STUDY_THREADS };
    const outcome = await runInThread<ComputeOutcome<StudyResults>>(
      { task: 'study', input },
      { signal: ctx.signal, onProgress: (s, m) => ctx.report(s, m) },
    );
    if (!outcome.ok) throw new JobFailure(`The study could not be computed: ${outcome.message}`);
    await storeResultsOnce(ctx, data, {
      label: 'The study',
      method: outcome.results.method,
      store: (tx) => storeStudyResults(tx, study.id, data.inputVersion, outcome.results),
    });
  },

  recordFailure: (db, data, message) => recordStudyError(db, data.entityId, message),
};
