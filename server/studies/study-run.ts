/** What the run kernel needs to compute a horizon study in the background (server/runs/run-job-handler.ts). */
import type { StudyInputs, StudyResults } from '@shared/schemas/study';
import type { RunKind } from '../runs/run-kind';
import { findStudy, findStudySubjects, recordStudyError, storeStudyResults } from './studies.repo';
import { studyThreads } from './study-settings';
import { studyTask, type StudyComputeInput } from './study-task';

export const studyRun: RunKind<StudyInputs, StudyComputeInput, StudyResults> = {
  kind: 'study',
  queue: 'horizon-study',
  task: studyTask,
  words: {
    the: 'The study',
    listed: 'Horizon study',
    gone: 'The horizon study no longer exists.',
    inputsChanged: 'The study’s inputs changed after this job was queued.',
  },
  // The study reports its own progress from the start.
  progress: { reading: 0.01, scale: (share) => share },
  async load(db, id) {
    const row = await findStudy(db, id);
    if (!row) return undefined;
    const { study } = row;
    return { id: study.id, inputVersion: study.inputVersion, inputs: study.inputs, computed: study.results !== null };
  },
  input: (snapshot, series) => ({ inputs: snapshot.inputs, ...series, threads: studyThreads() }),
  store: storeStudyResults,
  recordFailure: recordStudyError,
  subjects: findStudySubjects,
};
