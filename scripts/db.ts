/** `npm run db:up | db:stop | db:migrate`: manage the private cluster and migrations. */
import { prepareDatabase } from './lib/database';
import { stopCluster, SetupError } from './lib/postgres';

const log = (m: string) => console.log(m);
const command = process.argv[2];

try {
  if (command === 'up' || command === 'migrate') {
    const url = await prepareDatabase(process.env.SLACKWATER_DB_NAME ?? 'slackwater', log);
    log(`Database ready: ${url.replace(/\/\/[^@]*@/, '//')}`);
  } else if (command === 'stop') {
    stopCluster(log);
  } else {
    console.error('usage: tsx scripts/db.ts up|migrate|stop');
    process.exit(2);
  }
} catch (error) {
  console.error(error instanceof SetupError ? error.message : error);
  process.exit(1);
}
