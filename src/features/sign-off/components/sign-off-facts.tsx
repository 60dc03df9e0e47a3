import { Link } from 'react-router-dom';
import type { PersonAt, SignOffRecord } from '@shared/schemas/sign-off';
import { formatMoment } from '@/lib/format';

function Person({ label, who, comment }: { label: string; who: PersonAt | null; comment?: string | null }) {
  if (!who) return null;
  return (
    <div>
      <dt className="text-xs font-semibold uppercase tracking-wide text-ink-500">{label}</dt>
      <dd className="text-ink-900">
        {who.name ?? who.id} <span className="text-ink-500">on {formatMoment(who.at)}</span>
        {comment && <q className="mt-0.5 block text-ink-700">{comment}</q>}
      </dd>
    </div>
  );
}

/** Who made, submitted and signed off the plan, when, and whether its checksum still holds. */
export function SignOffFacts({ record }: { record: SignOffRecord }) {
  return (
    <dl className="grid gap-3 sm:grid-cols-2">
      <Person label="Created by" who={record.created} />
      <Person label="Submitted by" who={record.submitted} />
      <Person label="Signed off by" who={record.approved} comment={record.approved?.comment} />
      <Person label="Rejected by" who={record.rejected} comment={record.rejected?.comment} />
      {record.superseded && (
        <div>
          <dt className="text-xs font-semibold uppercase tracking-wide text-ink-500">Superseded</dt>
          <dd className="text-ink-900">
            on {formatMoment(record.superseded.at)} by{' '}
            <Link className="text-seaglass-700 underline" to={`/plans/${record.superseded.byPlanId}`}>
              a newer approved plan
            </Link>
          </dd>
        </div>
      )}
      {record.copiedFrom && (
        <div>
          <dt className="text-xs font-semibold uppercase tracking-wide text-ink-500">Copied from</dt>
          <dd>
            <Link className="text-seaglass-700 underline" to={`/plans/${record.copiedFrom}`}>
              the rejected plan
            </Link>
          </dd>
        </div>
      )}
      {record.checksum && (
        <div className="sm:col-span-2">
          <dt className="text-xs font-semibold uppercase tracking-wide text-ink-500">Checksum (SHA-256 of inputs and results)</dt>
          <dd className="break-all font-mono text-sm text-ink-900">{record.checksum}</dd>
          {record.checksumVerified ? (
            <dd className="text-sm text-seaglass-700">Verified just now: the plan is exactly what was signed off.</dd>
          ) : (
            <dd role="alert" className="rounded bg-brick-100 px-2 py-1 text-sm font-semibold text-brick-700">
              The stored plan no longer matches its checksum: it was changed outside Slackwater. Do not use it; an administrator
              must restore it.
            </dd>
          )}
        </div>
      )}
    </dl>
  );
}
