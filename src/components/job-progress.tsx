import type { JobProgress } from '@shared/schemas/job';
import { formatDuration, formatPercent } from '@/lib/format';

const stateWords: Record<JobProgress['state'], string> = {
  queued: 'Waiting for a worker',
  running: 'Running',
  retrying: 'Retrying',
  completed: 'Done',
  failed: 'Failed',
};

/**
 * A background job's progress bar (progress bars for every
 * background job): share done, time left, the worker's message, and the error
 * when an attempt failed.
 */
export function JobProgressBar({ job, label }: { job: JobProgress; label: string }) {
  const share = job.state === 'completed' ? 1 : job.shareDone;
  const failed = job.state === 'failed';
  const barColour = failed ? 'bg-brick-600' : job.state === 'retrying' ? 'bg-amber-500' : 'bg-seaglass-600';
  return (
    <div className="space-y-1" aria-live="polite">
      <div className="flex flex-wrap items-baseline justify-between gap-2 text-sm">
        <span className="font-medium text-ink-800">
          {label}: {stateWords[job.state]}
          {job.attempt > 1 && job.state !== 'completed' ? ` (attempt ${job.attempt})` : ''}
        </span>
        <span className="tabular-nums text-ink-500">
          {formatPercent(share)}
          {job.etaSeconds !== null && job.state === 'running' ? ` · about ${formatDuration(job.etaSeconds)} left` : ''}
        </span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(share * 100)}
        className="h-2.5 w-full overflow-hidden rounded-full bg-ink-100"
      >
        <div
          className={`h-full rounded-full transition-[width] duration-500 ${barColour}`}
          style={{ width: `${Math.round(share * 100)}%` }}
        />
      </div>
      {job.message && !failed && <p className="text-xs text-ink-500">{job.message}</p>}
      {job.error && job.state !== 'completed' && (
        <p className={`text-sm ${failed ? 'text-brick-700' : 'text-amber-700'}`} role={failed ? 'alert' : undefined}>
          {job.error}
        </p>
      )}
    </div>
  );
}

/** True while the job may still change (poll it). */
export const isJobActive = (job: JobProgress | null | undefined) =>
  !!job && (job.state === 'queued' || job.state === 'running' || job.state === 'retrying');
