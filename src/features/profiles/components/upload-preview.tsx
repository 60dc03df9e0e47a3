import type { PreviewState } from '../hooks/use-profile-preview';
import { downsampleMinMax } from '../lib/downsample';
import { formatCount, formatLocalTime, formatNumber } from '@/lib/format';
import { describeStep, displayUnit } from '../lib/format';
import { LazySeriesChart } from './lazy-series-chart';
import { UploadIssuesTable } from './upload-issues-table';

export function UploadPreview({
  state,
  timezone,
  currency,
  hideIssues = false,
}: {
  state: PreviewState;
  timezone: string;
  currency: string;
  /** The server's list of the same problems is on the page instead. */
  hideIssues?: boolean;
}) {
  if (state.status === 'idle') return null;
  if (state.status === 'working')
    return (
      <p role="status" className="text-ink-500">
        Reading the file…
      </p>
    );
  if (state.status === 'failed-to-read')
    return (
      <p role="alert" className="text-brick-700">
        The browser could not read the file: {state.message}
      </p>
    );

  const { firstLines, result } = state;
  return (
    <section aria-label="Preview" className="space-y-3">
      <div>
        <h3 className="text-sm font-semibold text-ink-700">First lines of the file</h3>
        <pre className="mt-1 max-h-40 overflow-auto rounded bg-ink-900 p-2 text-xs text-ink-50">{firstLines.join('\n')}</pre>
      </div>
      {result.ok ? (
        <AcceptedPreview profile={result.profile} timezone={timezone} currency={currency} />
      ) : hideIssues ? null : (
        <UploadIssuesTable
          title={`The preview found ${result.issues.length === 1 ? 'a problem' : `${result.issues.length} problems`}`}
          issues={result.issues}
          hint={result.hint}
        />
      )}
    </section>
  );
}

type Accepted = Extract<Extract<PreviewState, { status: 'done' }>['result'], { ok: true }>['profile'];

function AcceptedPreview({ profile, timezone, currency }: { profile: Accepted; timezone: string; currency: string }) {
  const stepMs = profile.stepMinutes * 60_000;
  const endMs = profile.startMs + profile.values.length * stepMs;
  let min = Infinity;
  let max = -Infinity;
  for (const v of profile.values) {
    min = Math.min(min, v);
    max = Math.max(max, v);
  }
  const unit = displayUnit(profile.unit, currency);
  const delimiter = /semicolon/.test(profile.notes[0] ?? '') ? 'semicolon (;)' : 'comma (,)';
  const facts: [string, string][] = [
    ['Delimiter', delimiter],
    ['Resolution', describeStep(profile.stepMinutes)],
    ['From', formatLocalTime(profile.startMs, timezone)],
    ['To', formatLocalTime(endMs, timezone)],
    ['Intervals', formatCount(profile.values.length)],
    ['Min / max', `${formatNumber(min, 3)} / ${formatNumber(max, 3)} ${unit}`],
    ['Filled by interpolation', formatCount(profile.filledIndexes.length)],
  ];
  return (
    <div className="space-y-3">
      <dl className="grid grid-cols-2 gap-x-6 gap-y-1 rounded bg-seaglass-100 p-3 text-sm sm:grid-cols-4">
        {facts.map(([term, value]) => (
          <div key={term}>
            <dt className="text-xs uppercase tracking-wide text-ink-500">{term}</dt>
            <dd className="font-medium">{value}</dd>
          </div>
        ))}
      </dl>
      <LazySeriesChart
        points={downsampleMinMax(profile.startMs, stepMs, profile.values, 400)}
        timeZone={timezone}
        unit={unit}
        label="Preview"
        height={160}
      />
      <details>
        <summary className="cursor-pointer text-sm font-medium text-ink-700">What was detected and done</summary>
        <ul className="mt-1 list-disc pl-5 text-sm text-ink-700">
          {profile.notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      </details>
    </div>
  );
}
