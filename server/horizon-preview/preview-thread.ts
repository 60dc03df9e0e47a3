/**
 * Entry of the preview thread: re-solves a plan with another horizon (aligning
 * its profiles and solving its steady cycle the first time it meets the
 * snapshot) off the web process's event loop, one request at a time in arrival
 * order. It keeps the aligned profiles between requests, so the web process
 * sends the profile values only when the thread answers `miss`. An error in one
 * solve is answered, never thrown out of the thread.
 */
import { parentPort } from 'node:worker_threads';
import { AppError, unprocessable } from '../http/app-error';
import { PreviewCache, steadyOf } from './preview-cache';
import type { PreviewReply, PreviewRequest } from './preview-protocol';
import { hours, needsExactPath, previewEligibility, solvePreview } from './preview-solve';

const cache = new PreviewCache();

function answer(request: PreviewRequest): PreviewReply {
  const { id, key, inputs, horizonHours } = request;
  let source = cache.get(key);
  if (!source) {
    if (!request.series) return { id, type: 'miss' };
    source = cache.add(key, inputs, request.series);
  }
  const eligible = previewEligibility(source.aligned, inputs, horizonHours);
  if (!eligible.ok) throw needsExactPath(eligible.reason);
  const outcome = solvePreview(source.aligned, steadyOf(source, inputs.steadyDays), inputs, horizonHours);
  if (!outcome.ok) throw unprocessable(`The plan cannot be solved with a horizon of ${hours(horizonHours)}: ${outcome.message}.`);
  return { id, type: 'done', preview: outcome.preview };
}

parentPort?.on('message', (request: PreviewRequest) => {
  let reply: PreviewReply;
  try {
    reply = answer(request);
  } catch (error) {
    reply =
      error instanceof AppError
        ? {
            id: request.id,
            type: 'refused',
            refusal: { code: error.code, message: error.message, status: error.status, issues: error.issues, extra: error.extra },
          }
        : { id: request.id, type: 'failed', message: error instanceof Error ? (error.stack ?? error.message) : String(error) };
  }
  parentPort?.postMessage(reply);
});
