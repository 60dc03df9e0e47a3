/**
 * Worker-thread entry for horizon studies: receives the shared context once,
 * then one job per message, and answers with the run's figures (a chunk of a
 * parallel closed loop answers with its series too, for stitching).
 */
import { parentPort } from 'node:worker_threads';
import { failedRun } from './run-closed-loop';
import { runJob, runStudyJob, type StudyJob, type StudyJobContext } from './study-job';

let context: StudyJobContext | null = null;

parentPort?.on('message', (message: { context?: StudyJobContext; index?: number; job?: StudyJob }) => {
  if (message.context) context = message.context;
  if (message.job && message.index !== undefined && context) {
    let result;
    try {
      result = message.job.chunk ? runJob(context, message.job) : runStudyJob(context, message.job);
    } catch (error) {
      // An engine bug must not leave the parent waiting forever.
      result = { ...failedRun('error', `the run failed: ${String(error)}`, 0) };
    }
    parentPort?.postMessage({ index: message.index, result });
  }
});
