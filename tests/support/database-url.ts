import { clusterUrl } from '../../scripts/lib/postgres';

/** The API tests' database: TEST_DATABASE_URL, or the private cluster's `slackwater_test`. */
export function testDatabaseUrl(): string {
  return process.env.TEST_DATABASE_URL || clusterUrl('slackwater_test');
}
