import type { Request } from 'express';
import type { AuthUser } from '@shared/schemas/auth';
import { appConfig, clientIp, requireUser } from '../auth/current-user';

/** Who acts in the sign-off workflow, from where, and the origin for links in e-mails. */
export interface Actor {
  user: AuthUser;
  ip: string | null;
  appOrigin: string;
}

export function actorOf(req: Request): Actor {
  return { user: requireUser(req), ip: clientIp(req), appOrigin: appConfig(req).appOrigin };
}
