/**
 * `POST /api/plans/:id/horizon-preview {horizonHours}` → 200 with the preview
 * (shared/schemas/horizon-preview.ts). POST because it carries a body and
 * solves; it changes nothing. HTTP only: the rules live in the service.
 */
import { Router } from 'express';
import { horizonPreviewRequestSchema } from '@shared/schemas/horizon-preview';
import { requireUser } from '../auth/current-user';
import { AppError } from '../http/app-error';
import { pathId } from '../sites/request-context';
import { TokenBuckets } from './preview-rate-limit';
import { PreviewBusyError } from './preview-thread-client';
import * as service from './horizon-preview.service';

export const horizonPreviewRouter = Router();

/**
 * A slider debounced at 150 ms sends a few requests a second at most while it
 * moves; 20 at once and 5 a second after that leave room for it and stop a loop.
 */
export const previewLimiter = new TokenBuckets({ burst: 20, perSecond: 5 });

horizonPreviewRouter.post('/plans/:id/horizon-preview', async (req, res) => {
  const taken = previewLimiter.take(requireUser(req).id);
  if (!taken.ok) {
    res.setHeader('Retry-After', String(taken.retryAfterSeconds));
    throw new AppError('rate_limited', `Too many previews in a short time; wait ${taken.retryAfterSeconds} s and move the slider again.`, 429);
  }
  const id = pathId(req, 'plan');
  const body = horizonPreviewRequestSchema.parse(req.body);
  try {
    res.json(await service.previewHorizon(id, body));
  } catch (error) {
    if (error instanceof PreviewBusyError) res.setHeader('Retry-After', String(error.retryAfterSeconds));
    throw error;
  }
});
