import { Link } from 'react-router-dom';
import type { PlanEvent } from '@shared/schemas/sign-off';
import { formatMoment } from '@/lib/format';

const WORDS: Record<PlanEvent['action'], string> = {
  submitted: 'submitted it for sign-off',
  approved: 'approved it',
  rejected: 'rejected it',
  superseded: 'approved a newer plan, which superseded this one',
  copied: 'copied it into a new draft',
};

/** Every sign-off event, oldest first (the database keeps them append-only). */
export function SignOffHistory({ events }: { events: PlanEvent[] }) {
  if (events.length === 0) return <p className="text-sm text-ink-500">No sign-off actions yet.</p>;
  return (
    <ol aria-label="Sign-off history" className="space-y-2 border-l-2 border-ink-100 pl-4">
      {events.map((e) => (
        <li key={e.id} className="text-sm">
          <span className="text-ink-500">{formatMoment(e.at, true)}</span>{' '}
          <span className="font-medium text-ink-900">{e.actorName ?? e.actorEmail ?? 'someone'}</span> {WORDS[e.action]}
          {e.version !== null && <span className="text-ink-500"> (version {e.version})</span>}
          {e.comment && <q className="block text-ink-700">{e.comment}</q>}
          {e.action === 'copied' && typeof e.details.copyId === 'string' && (
            <Link className="ml-1 text-seaglass-700 underline" to={`/plans/${e.details.copyId}`}>
              open the copy
            </Link>
          )}
        </li>
      ))}
    </ol>
  );
}
