// `npm start`: dependencies, database, migrations, demo data, client build, server.
import path from 'node:path';
import { spawn } from 'node:child_process';
import { ensureDependencies, runBin } from './ensure-deps.mjs';

const root = path.resolve(import.meta.dirname, '..');
ensureDependencies(root);

if (runBin(root, 'tsx', ['scripts/prepare-demo.ts']) !== 0) process.exit(1);
console.log('Building the web client…');
if (runBin(root, 'vite', ['build', '--logLevel', 'warn']) !== 0) {
  console.error('The client build failed; see the output above.');
  process.exit(1);
}

// The server is started directly (not through npx) so Ctrl-C reaches it.
const server = spawn(path.join(root, 'node_modules', '.bin', 'tsx'), ['scripts/serve-demo.ts'], { cwd: root, stdio: 'inherit' });
const forward = (signal) => server.kill(signal);
process.on('SIGINT', forward);
process.on('SIGTERM', forward);
server.on('exit', (code) => process.exit(code ?? 0));
