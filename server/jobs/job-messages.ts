/** What the progress row says while a job waits between attempts. */

/** An attempt failed and pg-boss will try again. */
export const ATTEMPT_FAILED = 'This attempt failed; the job will be tried again.';

/** The worker's heartbeat is late (process killed, machine lost): the job waits to be taken over. */
export const WORKER_LOST = 'Worker lost: waiting to resume.';

/** The worker stopped on purpose (SIGTERM) and gave the job back without spending an attempt. */
export const HANDED_BACK = 'Handed back when its worker stopped; waiting for another worker.';

/** The error a lost worker's attempt ends with. */
export const LOST_WORKER_ERROR = 'The worker running this job stopped responding; another worker takes it over.';
