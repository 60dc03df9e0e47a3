/**
 * The one job handler of every run: read the snapshot's profiles, compute in a
 * worker thread, and store the results once (keyed by id and input version)
 * together with the job's final state and an audit event, in one transaction.
 * Runs again harmlessly after a crash: a second attempt finds the results
 * stored and only finishes its job.
 */
import type { ProfileRef } from '@shared/schemas/plan';
import { getDb, type DbOrTx } from '../db/client';
import { NO_ACTOR, recordAudit } from '../audit/audit.service';
import type { JobContext } from '../jobs/job-context';
import { finishJob } from '../jobs/job-progress.repo';
import { JobFailure, type JobData, type JobHandler, type JobSubject } from '../jobs/job-types';
import { loadSnapshotProfiles, SnapshotProfileError } from './profile-series';
import type { RunKind } from './run-kind';

type Profiles = { price: ProfileRef; load: ProfileRef | null; generation: ProfileRef | null };

const minuteText = (d: Date | undefined) => (d ? d.toISOString().slice(0, 16).replace('T', ' ') : '');

async function storeResultsOnce(
  ctx: JobContext,
  data: JobData,
  what: { the: string; method: string; store: (tx: DbOrTx) => Promise<boolean> },
): Promise<void> {
  await ctx.flush();
  await getDb().transaction(async (tx) => {
    const stored = await what.store(tx);
    await finishJob(tx, data.jobId, ctx.attempt, {
      state: 'completed',
      message: stored ? `${what.the} computed.` : `${what.the} was already computed.`,
    });
    if (!stored) return;
    await recordAudit(tx, NO_ACTOR, {
      action: `${data.kind}.computed`,
      entityType: data.kind,
      entityId: data.entityId,
      details: { jobId: data.jobId, attempt: ctx.attempt, inputVersion: data.inputVersion, method: what.method },
    });
  });
}

export function runJobHandler<Inputs extends { profiles: Profiles }, Input, R extends { method: string }>(
  kind: RunKind<Inputs, Input, R>,
): JobHandler {
  return {
    kind: kind.kind,
    queue: kind.queue,

    async run(ctx, data) {
      const db = getDb();
      const run = await kind.load(db, data.entityId);
      if (!run) throw new JobFailure(kind.words.gone);
      if (run.inputVersion !== data.inputVersion) throw new JobFailure(kind.words.inputsChanged);
      if (run.computed) {
        // Stored by an earlier attempt that died before finishing its job: just finish it.
        await finishJob(db, data.jobId, ctx.attempt, { state: 'completed', message: `${kind.words.the} was already computed.` });
        return;
      }
      ctx.report(kind.progress.reading, 'Reading the profiles.', true);
      const series = await loadSnapshotProfiles(db, run.inputs.profiles).catch((error: unknown) => {
        throw error instanceof SnapshotProfileError ? new JobFailure(error.message) : error;
      });
      const outcome = await ctx.inThread(kind.task, kind.input(run, series), (share, message) =>
        ctx.report(kind.progress.scale(share), message),
      );
      if (!outcome.ok) throw new JobFailure(`${kind.words.the} could not be computed: ${outcome.message}`);
      const { results } = outcome;
      await storeResultsOnce(ctx, data, {
        the: kind.words.the,
        method: results.method,
        store: (tx) => kind.store(tx, run.id, data.inputVersion, results),
      });
    },

    recordFailure: (db, data, message) => kind.recordFailure(db, data.entityId, message),

    async describe(db, ids) {
      const found = new Map((await kind.subjects(db, ids)).map((s) => [s.id, s]));
      return new Map(
        ids.map((id): [string, JobSubject] => {
          const s = found.get(id);
          const battery = s?.batteryName ? ` for ${s.batteryName}` : '';
          return [
            id,
            {
              siteId: s?.siteId ?? null,
              label: `${kind.words.listed}${battery}, ${minuteText(s?.start)} – ${minuteText(s?.end)} UTC`,
            },
          ];
        }),
      );
    },
  };
}
