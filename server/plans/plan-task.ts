/** The plan's thread task: its inputs snapshot and profile values in, its results out (server/solve-thread.ts runs it). */
import type { PlanInputs, PlanResults } from '@shared/schemas/plan';
import { runTask, type RunComputeInput } from '../runs/run-task';

export type PlanComputeInput = RunComputeInput<PlanInputs>;

export const planTask = runTask<PlanComputeInput, PlanResults>('plan');
