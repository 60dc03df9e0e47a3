/**
 * `POST /api/plans/:id/horizon-preview {horizonHours}` → 200 with the preview
 * (shared/schemas/horizon-preview.ts). POST because it carries a body and
 * solves; it changes nothing. HTTP only: the rules live in the service.
 */
import { Router } from 'express';
import { MemoryStore, rateLimit } from 'express-rate-limit';
import { horizonPreviewRequestSchema } from '@shared/schemas/horizon-preview';
import { requireUser } from '../auth/current-user';
import { AppError } from '../http/app-error';
import { pathId } from '../http/request-context';
import { PreviewBusyError } from './preview-thread-client';
import * as service from './horizon-preview.service';

export const horizonPreviewRouter = Router();

/**
 * Per user, in memory: the process has one preview thread for everyone, so one
 * user's slider must not crowd out the others. A slider debounced at 150 ms sends
 * a few requests a second while it moves; 50 per 10 s leave room for it and stop a loop.
 * Each web process counts its own share, which is enough to keep each responsive.
 */
export const PREVIEW_LIMIT = { windowMs: 10_000, limit: 50 } as const;
/** Exported so a test can use up one user's allowance without racing the window. */
export const previewLimitStore = new MemoryStore();

const previewLimit = rateLimit({
  ...PREVIEW_LIMIT,
  store: previewLimitStore,
  keyGenerator: (req) => requireUser(req).id,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  handler: (_req, res, next) => {
    const wait = res.getHeader('Retry-After') ?? Math.ceil(PREVIEW_LIMIT.windowMs / 1000);
    next(
      new AppError('rate_limited', `Too many previews in a short time; wait ${String(wait)} s and move the slider again.`, 429),
    );
  },
});

horizonPreviewRouter.post('/plans/:id/horizon-preview', previewLimit, async (req, res) => {
  const id = pathId(req, 'plan');
  const body = horizonPreviewRequestSchema.parse(req.body);
  try {
    res.json(await service.previewHorizon(id, body));
  } catch (error) {
    if (error instanceof PreviewBusyError) res.setHeader('Retry-After', String(error.retryAfterSeconds));
    throw error;
  }
});
