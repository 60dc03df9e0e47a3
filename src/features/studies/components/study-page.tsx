/** A horizon study: its progress while it runs, then the charts, the runs and the recommendation. */
import { Link, useParams } from 'react-router-dom';
import { steadyDaysLabels } from '@shared/schemas/steady-days';
import { ErrorState, LoadingState } from '@/components/query-state';
import { JobProgressBar } from '@/components/job-progress';
import { formatDuration, formatLocalTime } from '@/lib/format';
import { useStudy } from '../api/get-study';
import { LazyStudyCharts } from './lazy-study-charts';
import { RecommendationCard } from './recommendation-card';
import { StudyRunsTable } from './study-runs-table';

export function StudyPage() {
  const { id = '' } = useParams();
  const query = useStudy(id);
  if (query.isPending) return <LoadingState label="Loading the study…" />;
  if (query.isError)
    return <ErrorState error={query.error} onRetry={() => void query.refetch()} title="The study could not be loaded." />;
  const study = query.data;
  const tz = study.inputs?.site.timezone ?? 'UTC';
  const currency = study.inputs?.site.currency ?? '';
  const results = study.results;
  return (
    <article className="space-y-6">
      <header className="space-y-2">
        <p className="text-sm text-ink-500">
          <Link to="/studies" className="underline">
            Studies
          </Link>{' '}
          / {study.siteName}
        </p>
        <h1 className="text-2xl font-semibold text-ink-900">
          Horizon study for {study.batteryName} at {study.siteName}
        </h1>
        <p className="text-ink-700">
          {formatLocalTime(Date.parse(study.start), tz)} – {formatLocalTime(Date.parse(study.end), tz)}; horizons{' '}
          {study.horizonsHours.join(', ')} h; re-planning every {study.replanHours} h; terminal rules{' '}
          {study.terminalRules.join(', ')}; initial SoC {study.initialSocPct} %; steady cycle from{' '}
          {steadyDaysLabels[study.inputs?.steadyDays ?? 'all']}.
          {study.method &&
            ` Method: ${study.method === 'dp' ? 'exact dynamic program (fast path)' : study.method === 'lp' ? 'linear program' : 'both'}.`}
          {results && ` Computed in ${formatDuration(results.seconds)}.`}
        </p>
      </header>
      {study.job && study.job.state !== 'completed' && <JobProgressBar job={study.job} label="Running the study" />}
      {study.errorMessage && study.status === 'failed' && (
        <p role="alert" className="rounded border border-brick-600 bg-brick-100 p-4 text-ink-900">
          {study.errorMessage}
        </p>
      )}
      {results && (
        <>
          <RecommendationCard study={study} />
          <LazyStudyCharts runs={results.runs} targetGapPct={results.targetGapPct} />
          <section aria-labelledby="runs-heading" className="space-y-2">
            <h2 id="runs-heading" className="text-lg font-semibold text-ink-900">
              Runs
            </h2>
            <StudyRunsTable results={results} currency={currency} />
          </section>
          {results.notes.length > 0 && (
            <ul className="list-disc pl-5 text-xs text-ink-500">
              {results.notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
          )}
        </>
      )}
    </article>
  );
}
