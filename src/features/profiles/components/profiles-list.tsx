import { useState } from 'react';
import { Link } from 'react-router-dom';
import { PROFILE_KINDS, type ProfileKind } from '@shared/profile-csv';
import { compactSelect } from '@/components/form-field';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { useSiteProfiles } from '../api/get-site-profiles';
import { formatLocalTime } from '@/lib/format';
import { describeStep, displayUnit } from '../lib/format';
import { formatMoment } from '@/lib/format';

export function ProfilesList({ siteId, timezone, currency }: { siteId: string; timezone: string; currency: string }) {
  const profiles = useSiteProfiles(siteId);
  const [kind, setKind] = useState<ProfileKind | ''>('');
  if (profiles.isPending) return <LoadingState label="Loading profiles…" />;
  if (profiles.isError) return <ErrorState error={profiles.error} onRetry={() => void profiles.refetch()} />;
  if (profiles.data.length === 0)
    return (
      <EmptyState title="No profiles uploaded for this site yet.">Upload price, load or generation forecasts as CSV.</EmptyState>
    );
  const shown = kind ? profiles.data.filter((p) => p.kind === kind) : profiles.data;
  return (
    <div className="space-y-2">
      <label className="flex items-center gap-2 text-sm">
        Show
        <select
          aria-label="Show profiles of kind"
          className={compactSelect}
          value={kind}
          onChange={(e) => setKind(e.target.value as ProfileKind | '')}
        >
          <option value="">all kinds</option>
          {PROFILE_KINDS.map((k) => (
            <option key={k} value={k}>
              {k}
            </option>
          ))}
        </select>
      </label>
      <table className="w-full rounded bg-white text-left text-sm shadow-sm">
        <caption className="sr-only">Profiles</caption>
        <thead className="bg-ink-100 text-ink-700">
          <tr>
            <th scope="col" className="px-3 py-2">
              Name
            </th>
            <th scope="col" className="px-3 py-2">
              Kind
            </th>
            <th scope="col" className="px-3 py-2">
              Resolution
            </th>
            <th scope="col" className="px-3 py-2">
              Period ({timezone})
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Intervals
            </th>
            <th scope="col" className="px-3 py-2">
              Range
            </th>
            <th scope="col" className="px-3 py-2">
              Uploaded
            </th>
          </tr>
        </thead>
        <tbody>
          {shown.map((p) => (
            <tr key={p.id} className="border-t border-ink-100">
              <td className="px-3 py-2">
                <Link to={`/profiles/${p.id}`} className="font-medium text-seaglass-700 underline-offset-2 hover:underline">
                  {p.name}
                </Link>
              </td>
              <td className="px-3 py-2">{p.kind}</td>
              <td className="px-3 py-2">{describeStep(p.stepMinutes)}</td>
              <td className="px-3 py-2 tabular-nums">
                {formatLocalTime(Date.parse(p.start), timezone).slice(0, 16)} →{' '}
                {formatLocalTime(Date.parse(p.end), timezone).slice(0, 16)}
              </td>
              <td className="px-3 py-2 text-right tabular-nums">{p.valueCount.toLocaleString()}</td>
              <td className="px-3 py-2 tabular-nums">
                {p.min.toLocaleString()} … {p.max.toLocaleString()} {displayUnit(p.unit, currency)}
              </td>
              <td className="px-3 py-2">{formatMoment(p.uploadedAt)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {shown.length === 0 && <EmptyState title={`No ${kind} profiles.`} />}
    </div>
  );
}
