import { useId, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import type { SignOffRecord } from '@shared/schemas/sign-off';
import { inputClass } from '@/components/form-field';
import { ApiError } from '@/lib/api-client';
import { useApprovePlan } from '../api/approve-plan';
import { useCopyPlan } from '../api/copy-plan';
import { useRejectPlan } from '../api/reject-plan';
import { useSubmitPlan } from '../api/submit-plan';

const button = 'rounded px-4 py-2 text-sm font-semibold disabled:cursor-not-allowed disabled:opacity-50';

function errorText(error: unknown): string {
  if (error instanceof ApiError && error.issues.length > 0)
    return `${error.message} ${error.issues.map((i) => i.message).join(' ')}`;
  return error instanceof Error ? error.message : String(error);
}

/**
 * The buttons the signed-in user may use on this plan (the server decides; this
 * only hides what it would refuse). Every action sends the version on screen,
 * so acting on a plan someone else changed meanwhile answers 409, not a surprise.
 */
export function SignOffActions({ record }: { record: SignOffRecord }) {
  const id = useId();
  const navigate = useNavigate();
  const [comment, setComment] = useState('');
  const [checked, setChecked] = useState(false);
  const submit = useSubmitPlan();
  const approve = useApprovePlan();
  const reject = useRejectPlan();
  const copy = useCopyPlan();
  const busy = submit.isPending || approve.isPending || reject.isPending || copy.isPending;
  const failure = [submit, approve, reject, copy].find((m) => m.isError)?.error;
  const { can } = record;
  const payload = { planId: record.planId, version: record.version, ...(comment.trim() ? { comment: comment.trim() } : {}) };

  if (!can.submit && !can.approve && !can.reject && !can.copy) return null;
  return (
    <div className="space-y-3 rounded border border-ink-100 bg-white p-4">
      {(can.submit || can.approve || can.reject) && (
        <label htmlFor={`${id}-comment`} className="flex flex-col gap-1 text-sm font-medium text-ink-800">
          {can.reject ? 'Comment (required to reject; the planner receives it)' : 'Comment (optional)'}
          <textarea
            id={`${id}-comment`}
            rows={3}
            maxLength={2000}
            value={comment}
            onChange={(e) => setComment(e.target.value)}
            className={inputClass}
          />
        </label>
      )}
      {can.approve && (
        <label className="flex items-start gap-2 text-sm text-ink-800">
          <input type="checkbox" checked={checked} onChange={(e) => setChecked(e.target.checked)} className="mt-1" />I have
          checked this schedule against the cautions above.
        </label>
      )}
      <div className="flex flex-wrap gap-2">
        {can.submit && (
          <button
            type="button"
            disabled={busy}
            onClick={() => submit.mutate(payload)}
            className={`${button} bg-ink-900 text-white`}
          >
            Submit for sign-off
          </button>
        )}
        {can.approve && (
          <button
            type="button"
            disabled={busy || !checked}
            onClick={() => approve.mutate(payload)}
            className={`${button} bg-seaglass-700 text-white`}
          >
            Approve
          </button>
        )}
        {can.reject && (
          <button
            type="button"
            disabled={busy || comment.trim() === ''}
            onClick={() => reject.mutate({ planId: record.planId, version: record.version, comment: comment.trim() })}
            className={`${button} border border-amber-600 bg-white text-amber-700`}
          >
            Reject
          </button>
        )}
        {can.copy && (
          <button
            type="button"
            disabled={busy}
            onClick={() => copy.mutate(record.planId, { onSuccess: (c) => void navigate(`/plans/${c.id}`) })}
            className={`${button} bg-ink-900 text-white`}
          >
            Copy into a new draft
          </button>
        )}
      </div>
      {failure !== undefined && failure !== null && (
        <p role="alert" className="rounded bg-brick-100 px-3 py-2 text-sm text-brick-700">
          {errorText(failure)}
        </p>
      )}
    </div>
  );
}
