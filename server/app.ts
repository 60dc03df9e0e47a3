/** Builds the Express application: security headers, the JSON API under /api, the built client. */
import express, { type Router } from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { AppConfig } from './config';
import { errorHandler } from './http/error-handler';
import { AppError } from './http/app-error';
import { healthRouter } from './health/health.routes';
import { authRouter } from './auth/auth.routes';
import { usersRouter } from './users/users.routes';
import { auditRouter } from './audit/audit.routes';
import { mailRouter } from './mail/mail.routes';
import { configureMail } from './mail/mail.service';
import { requireSameOrigin } from './auth/origin-check';
import { loadSession } from './auth/session-middleware';
import { accessControl } from './auth/access-control';
import { listRoutes } from './auth/route-inventory';
import { sitesRouter } from './sites/sites.routes';
import { batteriesRouter } from './batteries/batteries.routes';
import { profilesRouter } from './profiles/profiles.routes';
import { signOffRouter } from './sign-off/sign-off.routes';
import { exportRouter } from './export/export.routes';
import { plansRouter } from './plans/plans.routes';
import { studiesRouter } from './studies/studies.routes';
import { jobsRouter } from './jobs/jobs.routes';
import { horizonPreviewRouter } from './horizon-preview/horizon-preview.routes';
import { registerJobKinds } from './job-kinds';
import { tokensRouter } from './tokens/tokens.routes';
import { openApiRouter } from './openapi/openapi.routes';
import { tokenAuthentication } from './tokens/token-auth';
import { unlessToken } from './tokens/token-request';
import { refuseTokenOnSessionOnlyRoutes } from './tokens/session-only-routes';
import { honourIdempotencyKey } from './idempotency/idempotency-key';

const clientDir = path.resolve(import.meta.dirname, '..', 'dist', 'client');

/** Routers mounted under /api, in order. Each module adds its router here. */
function apiRouters(): Router[] {
  return [
    healthRouter,
    authRouter,
    usersRouter,
    auditRouter,
    mailRouter,
    sitesRouter,
    batteriesRouter,
    profilesRouter,
    signOffRouter,
    exportRouter,
    plansRouter,
    horizonPreviewRouter,
    studiesRouter,
    jobsRouter,
    tokensRouter,
    openApiRouter,
  ];
}

export function createApp(config: AppConfig) {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.locals.config = config;
  configureMail(config);
  // The web process queues plans and studies (and, with RUN_WORKER, works them).
  registerJobKinds();

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          'default-src': ["'self'"],
          'object-src': ["'none'"],
          'base-uri': ["'none'"],
          'frame-ancestors': ["'none'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'upgrade-insecure-requests': null,
        },
      },
      referrerPolicy: { policy: 'same-origin' },
      strictTransportSecurity: config.appOrigin.startsWith('https:'),
    }),
  );

  const api = express.Router();
  api.use((_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  // `Authorization: Bearer <token>` → req.user; a bad token is a 401 here (server/tokens/token-auth.ts).
  api.use(tokenAuthentication(config));
  // CSRF: state-changing cookie requests must come from our origin (server/auth/origin-check.ts).
  api.use(unlessToken(requireSameOrigin(config.appOrigin)));
  api.use(express.json({ limit: '1mb' }));
  // Session → req.user, then the access table decides (server/auth/access-table.ts).
  api.use(unlessToken(loadSession(config)));
  api.use(accessControl(() => listRoutes(api, '/api')));
  api.use(refuseTokenOnSessionOnlyRoutes);
  // A retried POST with the same Idempotency-Key gets the first answer again (uploads: in their route).
  api.use(honourIdempotencyKey());
  for (const router of apiRouters()) api.use(router);
  api.use((req, _res, next) => next(new AppError('not_found', `No API route ${req.method} ${req.path}.`, 404)));
  app.use('/api', api);

  if (existsSync(clientDir)) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    app.get(['/', '/*splat'], (_req, res) => res.sendFile(path.join(clientDir, 'index.html')));
  }

  app.use(errorHandler);
  return app;
}
