/** Every kind of background job and the module that runs it. */
import { planJobHandler } from '../plans/plan-job';
import { studyJobHandler } from '../studies/study-job';
import type { JobHandler } from './job-types';

export const jobHandlers: readonly JobHandler[] = [planJobHandler, studyJobHandler];
