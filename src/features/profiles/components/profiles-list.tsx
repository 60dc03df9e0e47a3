import { useState } from 'react';
import { Link } from 'react-router-dom';
import { PROFILE_KINDS, type ProfileKind } from '@shared/profile-csv';
import { compactSelect } from '@/components/form-field';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { ScrollRegion } from '@/components/scroll-region';
import { numClass, tableClass, tdClass, thClass, theadClass } from '@/components/table-classes';
import { formatCount, formatLocalTime, formatMoment, formatNumber } from '@/lib/format';
import { useSiteProfiles } from '../api/get-site-profiles';
import { describeStep, displayUnit } from '../lib/format';

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
      <ScrollRegion label="Profiles table (scrolls sideways)">
        <table className={tableClass}>
          <caption className="sr-only">Profiles</caption>
          <thead className={theadClass}>
            <tr>
              <th scope="col" className={thClass}>
                Name
              </th>
              <th scope="col" className={thClass}>
                Kind
              </th>
              <th scope="col" className={thClass}>
                Resolution
              </th>
              <th scope="col" className={thClass}>
                Period ({timezone})
              </th>
              <th scope="col" className={`${thClass} ${numClass}`}>
                Intervals
              </th>
              <th scope="col" className={`${thClass} ${numClass}`}>
                Range
              </th>
              <th scope="col" className={thClass}>
                Uploaded
              </th>
            </tr>
          </thead>
          <tbody>
            {shown.map((p) => (
              <tr key={p.id} className="border-t border-ink-100">
                <td className={`${tdClass} min-w-48`}>
                  <Link to={`/profiles/${p.id}`} className="font-medium text-seaglass-700 underline-offset-2 hover:underline">
                    {p.name}
                  </Link>
                </td>
                <td className={tdClass}>{p.kind}</td>
                <td className={`${tdClass} whitespace-nowrap`}>{describeStep(p.stepMinutes)}</td>
                <td className={`${tdClass} whitespace-nowrap tabular-nums`}>
                  {formatLocalTime(Date.parse(p.start), timezone).slice(0, 16)} →{' '}
                  {formatLocalTime(Date.parse(p.end), timezone).slice(0, 16)}
                </td>
                <td className={`${tdClass} ${numClass}`}>{formatCount(p.valueCount)}</td>
                <td className={`${tdClass} ${numClass}`}>
                  {formatNumber(p.min, 2)} … {formatNumber(p.max, 2)} {displayUnit(p.unit, currency)}
                </td>
                <td className={`${tdClass} whitespace-nowrap tabular-nums`}>{formatMoment(p.uploadedAt)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
      {shown.length === 0 && <EmptyState title={`No ${kind} profiles.`} />}
    </div>
  );
}
