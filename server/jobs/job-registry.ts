/**
 * The kinds of background job this process queues or works, registered at
 * start-up by the composition root (server/job-kinds.ts, called from
 * server/app.ts and server/worker.ts). The job runner knows nothing about
 * what a kind computes: only its queue and its handler.
 */
import type { JobKind } from '@shared/schemas/job';
import type { JobHandler } from './job-types';

const handlers = new Map<JobKind, JobHandler>();

/** Registers (or replaces) the handler of a kind; its queue is created when pg-boss starts. */
export function registerJobHandler(handler: JobHandler): void {
  handlers.set(handler.kind, handler);
}

export function registeredHandlers(): JobHandler[] {
  return [...handlers.values()];
}

export function handlerOf(kind: JobKind): JobHandler {
  const handler = handlers.get(kind);
  if (!handler)
    throw new Error(`No handler is registered for ${kind} jobs: register the job kinds at start-up (server/job-kinds.ts).`);
  return handler;
}
