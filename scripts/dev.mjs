// `npm run dev`: the API with reload on 3001 and Vite with hot reload on 5173 (proxying /api).
import path from 'node:path';
import { spawn } from 'node:child_process';
import { ensureDependencies, runBin } from './ensure-deps.mjs';

const root = path.resolve(import.meta.dirname, '..');
ensureDependencies(root);
if (runBin(root, 'tsx', ['scripts/prepare-demo.ts']) !== 0) process.exit(1);

const bin = (name) => path.join(root, 'node_modules', '.bin', name);
const env = { ...process.env, PORT: '3001', APP_ORIGIN: 'http://localhost:5173', NODE_ENV: 'development' };
env.DATABASE_URL ||= `postgres://postgres@127.0.0.1:${process.env.SLACKWATER_PG_PORT ?? 54329}/slackwater`;
const children = [
  spawn(bin('tsx'), ['watch', 'server/index.ts'], { cwd: root, env, stdio: 'inherit' }),
  spawn(bin('vite'), [], { cwd: root, env: { ...process.env, API_PORT: '3001' }, stdio: 'inherit' }),
];
const stop = () => children.forEach((c) => c.kill('SIGTERM'));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
for (const child of children) child.on('exit', () => stop());
