/**
 * The four demo accounts loaded by `npm start` (listed in the README as demo only).
 * Their shared password is printed in the README, so the new-password policy refuses it
 * everywhere else; the seeder hashes it directly. Idempotent: existing accounts are kept.
 */
import type { Role } from '@shared/schemas/auth';
import { loadConfig } from '../config';
import { getDb } from '../db/client';
import { hashPassword } from '../auth/password-hash';
import type { Actor } from '../http/request-context';
import { findUserByEmail, insertUser } from '../users/users.repo';

export const demoPassword = 'slackwater-demo';

const demoAccounts: readonly { email: string; name: string; role: Role }[] = [
  { email: 'admin@slackwater.example', name: 'Morgan Reyes', role: 'admin' },
  { email: 'planner@slackwater.example', name: 'Priya Nair', role: 'planner' },
  { email: 'approver@slackwater.example', name: 'Tomas Lind', role: 'approver' },
  { email: 'viewer@slackwater.example', name: 'Vera Okafor', role: 'viewer' },
];

/** Deterministic ids, so other seeders can refer to the demo planner and approver. */
const demoUserId = (role: Role) => `00000000-0000-4000-a000-00000000000${demoAccounts.findIndex((a) => a.role === role) + 1}`;

/** A demo account acting for a seeder: audit rows name it, from the address "seed". */
export function demoActor(role: Role, databaseUrl: string): Actor {
  const account = demoAccounts.find((a) => a.role === role);
  if (!account) throw new Error(`no demo ${role} account`);
  const { appOrigin } = loadConfig({ ...process.env, DATABASE_URL: databaseUrl });
  return { id: demoUserId(role), email: account.email, name: account.name, role, ip: 'seed', origin: appOrigin };
}

export async function seedDemoAccounts(log: (m: string) => void): Promise<void> {
  const db = getDb();
  let created = 0;
  for (const account of demoAccounts) {
    if (await findUserByEmail(db, account.email)) continue;
    const passwordHash = await hashPassword(demoPassword);
    if (await insertUser(db, { id: demoUserId(account.role), ...account, passwordHash, passwordChangedAt: new Date() }))
      created += 1;
  }
  log(created ? `Demo accounts created: ${created} (password "${demoPassword}", demo only).` : 'Demo accounts present.');
}
