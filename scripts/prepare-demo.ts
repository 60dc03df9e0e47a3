/** Starts the database, applies migrations and loads the demo scenario (idempotent). */
import { prepareDatabase } from './lib/database';
import { SetupError } from './lib/postgres';
import { seedDemo } from './lib/seed-demo';

try {
  const url = await prepareDatabase('slackwater', (m) => console.log(m));
  await seedDemo(url, (m) => console.log(m));
} catch (error) {
  console.error(error instanceof SetupError ? error.message : error);
  process.exit(1);
}
