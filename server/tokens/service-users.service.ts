/**
 * Service users: accounts for pipelines and other programs. An admin gives one a
 * name and a role; it has no password and cannot sign in, and acts only through the
 * tokens an admin creates for it. Its address lies under `.invalid` (RFC 2606), a
 * domain that never receives mail, and it is never sent links.
 */
import { randomBytes, randomUUID } from 'node:crypto';
import type { Role } from '@shared/schemas/auth';
import type { CreatedToken, ServiceUser } from '@shared/schemas/tokens';
import { getDb } from '../db/client';
import { notFound } from '../http/app-error';
import { recordAudit } from '../audit/audit.service';
import type { Actor } from '../http/request-context';
import { findUserById, insertUser, listServiceUsers as listServiceUserRows } from '../users/users.repo';
import type { UserRow } from '../users/users.schema';
import { listUnrevokedTokens } from './tokens.repo';
import { createToken, toApiToken } from './tokens.service';

const SERVICE_DOMAIN = 'service-users.invalid';

function serviceEmail(name: string): string {
  const slug = name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 40);
  return `${slug || 'service'}-${randomBytes(3).toString('hex')}@${SERVICE_DOMAIN}`;
}

function toServiceUser(row: UserRow, tokens: ServiceUser['tokens']): ServiceUser {
  return {
    id: row.id,
    name: row.name,
    email: row.email,
    role: row.role,
    disabled: row.disabled,
    createdAt: row.createdAt.toISOString(),
    tokens,
  };
}

export async function createServiceUser(input: { name: string; role: Role }, actor: Actor): Promise<ServiceUser> {
  return getDb().transaction(async (tx) => {
    const row = await insertUser(tx, {
      id: randomUUID(),
      email: serviceEmail(input.name),
      name: input.name,
      role: input.role,
      kind: 'service',
    });
    if (!row) throw new Error('A generated service-user address collided; try again.');
    await recordAudit(tx, actor, {
      action: 'user.service_created',
      entityType: 'user',
      entityId: row.id,
      details: { name: row.name, role: row.role },
    });
    return toServiceUser(row, []);
  });
}

export async function listServiceUsers(): Promise<ServiceUser[]> {
  const db = getDb();
  const rows = await listServiceUserRows(db);
  const tokens = await listUnrevokedTokens(
    db,
    rows.map((r) => r.id),
  );
  return rows.map((r) => toServiceUser(r, tokens.filter((t) => t.userId === r.id).map(toApiToken)));
}

async function requireServiceUser(id: string): Promise<UserRow> {
  const row = await findUserById(getDb(), id);
  if (!row || row.kind !== 'service') throw notFound('The service user');
  return row;
}

export async function createServiceUserToken(
  serviceUserId: string,
  input: { name: string; expiresInDays: number },
  actor: Actor,
): Promise<CreatedToken> {
  await requireServiceUser(serviceUserId);
  return createToken(serviceUserId, input, actor);
}
