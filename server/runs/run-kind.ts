/**
 * What a kind of run (a plan, a horizon study) tells the kernel so one job
 * handler can compute it: how to read its snapshot and store its results, the
 * thread task that computes it, and the words its messages use.
 */
import type { JobKind } from '@shared/schemas/job';
import type { DbOrTx } from '../db/client';
import type { SnapshotSeries } from './profile-series';
import type { RunTask } from './run-task';

/** A run as its job needs it: which inputs, which version, and whether results are stored already. */
export interface RunSnapshot<Inputs> {
  readonly id: string;
  readonly inputVersion: number;
  readonly inputs: Inputs;
  readonly computed: boolean;
}

/** What the job list says about a run. */
export interface RunSubject {
  readonly id: string;
  readonly siteId: string;
  readonly batteryName: string | null;
  readonly start: Date;
  readonly end: Date;
}

export interface RunKind<Inputs, Input, Results extends { method: string }> {
  readonly kind: JobKind;
  /** The pg-boss queue; the name stays as it is, queued jobs live in it. */
  readonly queue: string;
  readonly task: RunTask<Input, Results>;
  readonly words: {
    /** "The plan": how progress messages name the run. */
    readonly the: string;
    /** "Plan": how the job list names it. */
    readonly listed: string;
    readonly gone: string;
    readonly inputsChanged: string;
  };
  /** Share shown while the profiles are read, and the job's share for the thread's share. */
  readonly progress: { readonly reading: number; scale(share: number): number };
  load(db: DbOrTx, id: string): Promise<RunSnapshot<Inputs> | undefined>;
  input(snapshot: RunSnapshot<Inputs>, series: SnapshotSeries): Input;
  /** Stores the results once: false when they are stored already or the inputs moved on. */
  store(tx: DbOrTx, id: string, inputVersion: number, results: Results): Promise<boolean>;
  recordFailure(db: DbOrTx, id: string, message: string): Promise<void>;
  subjects(db: DbOrTx, ids: readonly string[]): Promise<RunSubject[]>;
}
