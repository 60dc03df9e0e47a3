/** Serves app and API against the private cluster's demo database (or DATABASE_URL). */
import { clusterUrl } from './lib/postgres';

process.env.DATABASE_URL ||= clusterUrl('slackwater');
const port = process.env.PORT ?? '3000';
process.env.NODE_ENV ??= 'production';
await import('../server/index');
console.log(`\nSlackwater is running at http://localhost:${port}`);
console.log('Demo sign-in (demo only): planner@slackwater.example / slackwater-demo');
console.log('Other demo accounts: admin@, approver@, viewer@slackwater.example, same password. Ctrl-C stops the server.\n');
