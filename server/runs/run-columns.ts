/**
 * The columns plans and horizon studies share: where a run comes from (site,
 * battery, profiles, none deletable while used) and the job computing it. Plans
 * and studies reach the job tables only through this kernel.
 */
import { uuid } from 'drizzle-orm/pg-core';
import { sites } from '../sites/sites.schema';
import { batteries } from '../batteries/batteries.schema';
import { profiles } from '../profiles/profiles.schema';
import { jobProgress } from '../jobs/jobs.schema';

export function runSourceColumns() {
  return {
    siteId: uuid('site_id')
      .notNull()
      .references(() => sites.id, { onDelete: 'restrict' }),
    batteryId: uuid('battery_id')
      .notNull()
      .references(() => batteries.id, { onDelete: 'restrict' }),
    priceProfileId: uuid('price_profile_id')
      .notNull()
      .references(() => profiles.id, { onDelete: 'restrict' }),
    loadProfileId: uuid('load_profile_id').references(() => profiles.id, { onDelete: 'restrict' }),
    generationProfileId: uuid('generation_profile_id').references(() => profiles.id, { onDelete: 'restrict' }),
  };
}

/** The run's job (its progress row), set when the run is created with its job. */
export const runJobColumn = () => uuid('job_id').references(() => jobProgress.jobId, { onDelete: 'restrict' });

/** The job progress table, for the joins that list a run with its job's state. */
export { jobProgress as runJobs } from '../jobs/jobs.schema';
export type { JobProgressRow as RunJobRow } from '../jobs/jobs.schema';
