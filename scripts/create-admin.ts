/**
 * `npm run create-admin`: creates the first admin of a real installation.
 *
 * Interactive:      npm run create-admin
 * Non-interactive:  npm run create-admin -- --email ops@example.com --name "Ops Lead" --password-stdin < secret.txt
 *                   (or SLACKWATER_ADMIN_PASSWORD in the environment; never a password on the command line,
 *                   where other users of the machine could read it in the process list)
 * Uses DATABASE_URL, or the private cluster's `slackwater` database, and migrates it first.
 */
import { createInterface } from 'node:readline/promises';
import { Writable } from 'node:stream';
import { parseArgs } from 'node:util';
import { emailSchema } from '@shared/schemas/auth';
import { inviteUserSchema } from '@shared/schemas/users';
import { prepareDatabase } from './lib/database';
import { SetupError } from './lib/postgres';
import { closeDb, initDb } from '../server/db/client';
import { AppError } from '../server/http/app-error';
import { passwordProblems } from '../server/auth/password-policy';
import { createAdminAccount } from '../server/users/users.service';

const usage = 'Usage: npm run create-admin [-- --email ADDRESS --name "FULL NAME" --password-stdin]';

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks)
    .toString('utf8')
    .replace(/\r?\n$/, '');
}

/** A prompt whose answer is not echoed (for passwords). */
async function askHidden(question: string): Promise<string> {
  let muted = false;
  const output = new Writable({
    write(chunk, encoding, callback) {
      if (!muted) process.stdout.write(chunk, encoding);
      callback();
    },
  });
  const rl = createInterface({ input: process.stdin, output, terminal: true });
  const answer = rl.question(question);
  muted = true;
  const value = await answer;
  rl.close();
  process.stdout.write('\n');
  return value;
}

async function ask(question: string): Promise<string> {
  const rl = createInterface({ input: process.stdin, output: process.stdout });
  const value = await rl.question(question);
  rl.close();
  return value.trim();
}

async function collect() {
  const { values } = parseArgs({
    options: {
      email: { type: 'string' },
      name: { type: 'string' },
      'password-stdin': { type: 'boolean' },
      help: { type: 'boolean' },
    },
  });
  if (values.help) {
    console.log(usage);
    process.exit(0);
  }
  const interactive = process.stdin.isTTY && !values['password-stdin'];
  let email = values.email ?? (interactive ? await ask('E-mail address of the admin: ') : '');
  while (interactive && !emailSchema.safeParse(email).success) email = await ask('That is not an e-mail address. E-mail: ');
  const name = values.name ?? (interactive ? await ask('Full name: ') : '');
  let password = values['password-stdin'] ? await readStdin() : (process.env.SLACKWATER_ADMIN_PASSWORD ?? '');
  if (!password && interactive) {
    for (;;) {
      password = await askHidden('Password (12 to 128 characters, a phrase of unrelated words works well): ');
      const problems = passwordProblems(password, { email, name });
      if (problems.length) {
        console.log(problems.map((p) => `  - ${p}`).join('\n'));
        continue;
      }
      if ((await askHidden('The same password again: ')) === password) break;
      console.log('  - The two passwords differ. Try again.');
    }
  }
  const parsed = inviteUserSchema.safeParse({ email, name, role: 'admin' });
  if (!parsed.success || !password) {
    const issues = parsed.success ? [] : parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    if (!password)
      issues.push('  password: give it with --password-stdin or SLACKWATER_ADMIN_PASSWORD, or run in a terminal to be asked.');
    throw new SetupError(`Cannot create the admin:\n${issues.join('\n')}\n${usage}`);
  }
  return { email: parsed.data.email, name: parsed.data.name, password };
}

try {
  const input = await collect();
  const url = await prepareDatabase('slackwater', (m) => console.log(m));
  initDb(url, 2);
  const admin = await createAdminAccount(input);
  console.log(`Admin ${admin.email} created. Sign in at the app's address with this e-mail and password.`);
  await closeDb();
} catch (error) {
  await closeDb();
  if (error instanceof AppError) {
    const details = error.issues?.map((i) => `  - ${i.message}`).join('\n');
    console.error(`${error.message}${details ? `\n${details}` : ''}`);
  } else console.error(error instanceof SetupError ? error.message : error);
  process.exit(1);
}
