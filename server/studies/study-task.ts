/** The horizon study's thread task: its snapshot, profile values and thread count in, its results out (server/solve-thread.ts runs it). */
import type { StudyInputs, StudyResults } from '@shared/schemas/study';
import { runTask, type RunComputeInput } from '../runs/run-task';

export type StudyComputeInput = RunComputeInput<StudyInputs> & {
  /** Threads the engine may use for independent runs (1 = this thread only). */
  readonly threads: number;
};

export const studyTask = runTask<StudyComputeInput, StudyResults>('study');
