/** Contracts between the job runner and the modules whose work it runs. */
import type { JobKind } from '@shared/schemas/job';
import type { DbOrTx } from '../db/client';
import type { JobContext } from './job-context';

/** The data of every queued job: which entity, and which version of its inputs. */
export interface JobData {
  readonly jobId: string;
  readonly kind: JobKind;
  readonly entityId: string;
  readonly inputVersion: number;
}

/**
 * A failure that another attempt cannot fix (infeasible model, data missing):
 * the job ends at once with this message instead of being retried.
 */
export class JobFailure extends Error {
  override name = 'JobFailure';
}

/** What the job list says a job computes. */
export interface JobSubject {
  readonly siteId: string | null;
  readonly label: string;
}

export interface JobHandler {
  readonly kind: JobKind;
  /** The pg-boss queue of this kind (kept stable: queued jobs live in it). */
  readonly queue: string;
  /**
   * Computes and stores the results. Must be idempotent: results are written in
   * one transaction keyed by entity id and input version, which also finishes
   * the job's progress row; a second run finds them stored and writes nothing.
   */
  run(ctx: JobContext, data: JobData): Promise<void>;
  /** Records the final failure on the entity (in the transaction that fails the job). */
  recordFailure(db: DbOrTx, data: JobData, message: string): Promise<void>;
  /** What each entity is, for the job list; every id asked for gets an answer. */
  describe(db: DbOrTx, entityIds: readonly string[]): Promise<Map<string, JobSubject>>;
}
