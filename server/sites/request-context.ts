/**
 * What the site, battery and profile handlers need from a request besides its
 * body: who acts (for audit rows and created_by) and the ids in the path.
 */
import type { Request } from 'express';
import { z } from 'zod';
import { clientIp, requireUser } from '../auth/current-user';
import { type AppError, notFound } from '../http/app-error';

export interface Actor {
  id: string;
  email: string;
  ip: string;
}

export function actorFrom(req: Request): Actor {
  const user = requireUser(req);
  return { id: user.id, email: user.email, ip: clientIp(req) };
}

/** The audit fields that name the actor, for insertAuditEvent. */
export function auditActor(actor: Actor) {
  return { actorId: actor.id, actorEmail: actor.email, ip: actor.ip };
}

const idSchema = z.uuid();

/** A path id; one that is not a UUID cannot name anything, so it is answered as not found. */
export function pathId(req: Request, what: string, param = 'id'): string {
  const raw = req.params[param];
  const parsed = idSchema.safeParse(raw);
  if (!parsed.success) throw notFound(`The ${what} "${String(raw).slice(0, 60)}"`);
  return parsed.data;
}

/** The PostgreSQL error code behind a (possibly Drizzle-wrapped) query error. */
export function pgErrorCode(error: unknown): string | undefined {
  for (let e: unknown = error; e && typeof e === 'object'; e = (e as { cause?: unknown }).cause) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string' && /^[0-9A-Z]{5}$/.test(code)) return code;
  }
  return undefined;
}

export const UNIQUE_VIOLATION = '23505';
export const FOREIGN_KEY_VIOLATION = '23503';

/** Runs `work`; a unique-constraint violation becomes `conflictError` (a clear 409 instead of a 500). */
export async function withUniqueCheck<T>(work: () => Promise<T>, conflictError: () => AppError): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (pgErrorCode(error) === UNIQUE_VIOLATION) throw conflictError();
    throw error;
  }
}
