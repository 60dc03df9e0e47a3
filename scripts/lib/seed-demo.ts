/**
 * Loads the demo scenario into a database. Each module adds its demo data
 * through a seeder here; seeders are idempotent (a second run changes nothing).
 */
import { closeDb, initDb } from '../../server/db/client';
import { registerJobKinds } from '../../server/job-kinds';
import { seedDemoAccounts } from '../../server/demo/demo-accounts';
import { seedDemoSite } from '../../server/demo/demo-site';
import { seedDemoPlans } from '../../server/demo/demo-plans';

type Seeder = (log: (m: string) => void, databaseUrl: string) => Promise<void>;

/** Seeders run in order: accounts first, then sites, batteries, profiles, then plans and a study. */
const seeders: Seeder[] = [seedDemoAccounts, seedDemoSite, seedDemoPlans];

export async function seedDemo(url: string, log: (m: string) => void): Promise<void> {
  initDb(url, 2);
  // The demo plans and study are queued and computed through the background jobs.
  registerJobKinds();
  try {
    for (const seed of seeders) await seed(log, url);
  } finally {
    await closeDb();
  }
}
