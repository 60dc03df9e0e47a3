/**
 * What every handler needs from a request besides its body: who acts (one
 * `Actor` for audit rows, created_by columns, sign-off and e-mail links) and
 * the ids in the path.
 */
import type { Request } from 'express';
import { z } from 'zod';
import type { AuthUser } from '@shared/schemas/auth';
import { appConfig, clientIp, requireUser } from '../auth/current-user';
import type { AnonymousAuthor } from '../audit/audit.service';
import { notFound, unprocessable } from './app-error';

/** The signed-in user (id, e-mail, name, role), where the request came from, and the origin links in e-mails point to. */
export interface Actor extends AuthUser {
  readonly ip: string | null;
  readonly origin: string;
}

export function actorOf(req: Request): Actor {
  return { ...requireUser(req), ip: clientIp(req), origin: appConfig(req).appOrigin };
}

/**
 * What an audit row can say about any request, signed in or not: the access gate
 * records refusals before a handler (and its Actor) exists.
 */
export function requestAuthor(req: Request): AnonymousAuthor {
  return { actorId: req.user?.id ?? null, actorEmail: req.user?.email ?? null, ip: clientIp(req) };
}

const idFormats = {
  uuid: z.uuid(),
  /** A bigserial id, such as a mail outbox message's. */
  serial: z.coerce.number().int().positive().max(Number.MAX_SAFE_INTEGER),
};

export interface PathIdOptions {
  /** The route parameter, `id` unless named. */
  readonly param?: string;
  /**
   * How a malformed id is answered: by default as not found (it cannot name anything);
   * with `invalid` as a 422 with this message as the issue of the parameter.
   */
  readonly invalid?: string;
}

/** An id from the path (a UUID, or a bigserial number with `format: 'serial'`), or the answer for one that is not. */
export function pathId(req: Request, what: string, options?: PathIdOptions & { readonly format?: 'uuid' }): string;
export function pathId(req: Request, what: string, options: PathIdOptions & { readonly format: 'serial' }): number;
export function pathId(
  req: Request,
  what: string,
  options: PathIdOptions & { readonly format?: keyof typeof idFormats } = {},
): string | number {
  const param = options.param ?? 'id';
  const raw = req.params[param];
  const parsed = idFormats[options.format ?? 'uuid'].safeParse(raw);
  if (parsed.success) return parsed.data;
  if (options.invalid) throw unprocessable('The request is invalid: see issues.', [{ path: param, message: options.invalid }]);
  throw notFound(`The ${what} "${String(raw).slice(0, 60)}"`);
}
