/**
 * Loads the demo scenario into a database. Each module adds its demo data
 * through a seeder here; seeders are idempotent (a second run changes nothing).
 */
import { closeDb, initDb } from '../../server/db/client';
import { seedDemoAccounts } from '../../server/users/demo-accounts';
import { seedDemoSite } from '../../server/sites/demo-site';

type Seeder = (log: (m: string) => void) => Promise<void>;

/** Seeders run in order: accounts first, then sites, batteries, profiles. */
const seeders: Seeder[] = [seedDemoAccounts, seedDemoSite];

export async function seedDemo(url: string, log: (m: string) => void): Promise<void> {
  initDb(url, 2);
  try {
    for (const seed of seeders) await seed(log);
  } finally {
    await closeDb();
  }
}
