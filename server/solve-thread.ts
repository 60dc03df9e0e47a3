/**
 * Entry of a job's worker thread: the computations a thread can run (pure
 * engine work, no database), each implementing the task its job sends. Job
 * kinds are registered in server/job-kinds.ts; this is their thread side.
 */
import { serveThreadTasks } from './jobs/thread-host';
import { implement } from './jobs/thread-task';
import { computePlan } from './plans/plan-compute';
import { planTask } from './plans/plan-task';
import { computeStudy } from './studies/study-compute';
import { studyTask } from './studies/study-task';

serveThreadTasks([implement(planTask, computePlan), implement(studyTask, computeStudy)]);
