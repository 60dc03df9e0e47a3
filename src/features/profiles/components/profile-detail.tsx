import { useState } from 'react';
import type { ProfileDetail as Profile } from '@shared/schemas/profile';
import { FormField, buttonClass, inputClass } from '@/components/form-field';
import { ErrorState, LoadingState } from '@/components/query-state';
import { profileOriginalUrl, useProfile } from '../api/get-profile';
import { downsampleMinMax } from '../lib/downsample';
import { formatCount, formatLocalTime, formatMoment, formatNumber } from '@/lib/format';
import { describeStep, displayUnit } from '../lib/format';
import { localMidnight } from '../lib/local-date';
import { DeleteProfileButton } from './delete-profile-button';
import { LazySeriesChart } from './lazy-series-chart';
import { ProfileValuesTable } from './profile-values-table';

/** The fewest decimals (0-4) that show every value as stored, so one profile's column lines up without hiding digits. */
function decimalsOf(values: readonly number[]): number {
  for (let d = 0; d < 4; d += 1) {
    const scale = 10 ** d;
    if (values.every((v) => Math.abs(Math.round(v * scale) / scale - v) <= 1e-9 * Math.max(1, Math.abs(v)))) return d;
  }
  return 4;
}

export interface ProfileDetailProps {
  id: string;
  timezone: string;
  currency: string;
  canEdit: boolean;
  onDeleted: (profile: Profile) => void;
}

/** Metadata, a chart and the numbers of one profile, optionally narrowed to local days [from, to). */
export function ProfileDetail({ id, timezone, currency, canEdit, onDeleted }: ProfileDetailProps) {
  const [from, setFrom] = useState('');
  const [to, setTo] = useState('');
  const range = { from: from ? localMidnight(from, timezone) : undefined, to: to ? localMidnight(to, timezone) : undefined };
  const profile = useProfile(id, Object.fromEntries(Object.entries(range).filter(([, v]) => v !== undefined)));
  if (profile.isPending) return <LoadingState label="Loading the profile…" />;
  if (profile.isError) return <ErrorState error={profile.error} onRetry={() => void profile.refetch()} />;

  const p = profile.data;
  const unit = displayUnit(p.unit, currency);
  const stepMs = p.stepMinutes * 60_000;
  const windowStart = Date.parse(p.window.start);
  const facts: [string, string][] = [
    ['Kind', p.kind],
    ['Unit', `${unit}${p.sourceUnit !== p.unit ? ` (uploaded as ${displayUnit(p.sourceUnit, currency)})` : ''}`],
    ['Resolution', describeStep(p.stepMinutes)],
    ['From', formatLocalTime(Date.parse(p.start), timezone)],
    ['To', formatLocalTime(Date.parse(p.end), timezone)],
    ['Intervals', formatCount(p.valueCount)],
    ['Min / mean / max', `${formatNumber(p.min, 3)} / ${formatNumber(p.mean, 3)} / ${formatNumber(p.max, 3)}`],
    ['Filled by interpolation', formatCount(p.filledCount)],
    ['Labels', p.intervalEnding ? 'interval-ending (shifted to starts)' : 'interval-beginning'],
    ['Original file', `${p.originalFilename} (${formatNumber(p.originalBytes / 1024, 1)} kB)`],
    ['SHA-256', p.originalSha256],
    ['Uploaded', `${formatMoment(p.uploadedAt)} by ${p.uploadedByName ?? p.uploadedBy}`],
  ];

  return (
    <div className="space-y-5">
      <dl className="grid grid-cols-1 gap-x-6 gap-y-2 rounded bg-white p-4 shadow-sm sm:grid-cols-3">
        {facts.map(([term, value]) => (
          <div key={term} className={term === 'SHA-256' ? 'sm:col-span-2' : ''}>
            <dt className="text-xs uppercase tracking-wide text-ink-500">{term}</dt>
            <dd className="break-all font-medium">{value}</dd>
          </div>
        ))}
      </dl>
      <div className="flex flex-wrap gap-3">
        <a className={buttonClass.secondary} href={profileOriginalUrl(p.id)} download={p.originalFilename}>
          Download the original file
        </a>
        {canEdit && <DeleteProfileButton profile={p} onDeleted={() => onDeleted(p)} />}
      </div>
      <details>
        <summary className="cursor-pointer text-sm font-medium text-ink-700">What was detected and done at upload</summary>
        <ul className="mt-1 list-disc pl-5 text-sm text-ink-700">
          {p.notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      </details>
      <div className="flex flex-wrap items-end gap-4">
        <FormField id="window-from" label={`From (local date, ${timezone})`}>
          <input id="window-from" type="date" className={inputClass} value={from} onChange={(e) => setFrom(e.target.value)} />
        </FormField>
        <FormField id="window-to" label="To (exclusive)">
          <input id="window-to" type="date" className={inputClass} value={to} onChange={(e) => setTo(e.target.value)} />
        </FormField>
        <p className="pb-2 text-sm text-ink-500">
          Showing {formatCount(p.window.count)} of {formatCount(p.valueCount)} intervals.
        </p>
      </div>
      <LazySeriesChart points={downsampleMinMax(windowStart, stepMs, p.values)} timeZone={timezone} unit={unit} label={p.name} />
      <ProfileValuesTable
        startMs={windowStart}
        stepMinutes={p.stepMinutes}
        values={p.values}
        filledIndexes={p.filledIndexes.filter((i) => i >= p.window.offset).map((i) => i - p.window.offset)}
        timeZone={timezone}
        unit={unit}
        decimals={decimalsOf(p.values)}
      />
    </div>
  );
}
