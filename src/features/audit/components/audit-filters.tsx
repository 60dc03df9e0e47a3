import { useState, type FormEvent } from 'react';
import { buttonClass, inputClass } from '@/components/form-field';
import type { AuditFilterValues } from '../api/get-audit-events';

/** Action families recorded so far; "plan." and others appear as the modules record them. */
const actionFamilies = [
  ['', 'All actions'],
  ['auth.', 'Sign-in and passwords'],
  ['user.', 'Users and roles'],
  ['access.', 'Refused requests'],
  ['plan.', 'Plans and sign-off'],
  ['site.', 'Sites'],
  ['battery.', 'Batteries'],
  ['profile.', 'Profiles'],
] as const;

/** Local date (yyyy-mm-dd) → the UTC instant of its start or end, for the API. */
const dayStart = (d: string) => (d ? new Date(`${d}T00:00:00`).toISOString() : undefined);
const dayEnd = (d: string) => (d ? new Date(`${d}T23:59:59.999`).toISOString() : undefined);

export function AuditFilters({ onApply }: { onApply: (filters: AuditFilterValues) => void }) {
  const [action, setAction] = useState('');
  const [actor, setActor] = useState('');
  const [from, setFrom] = useState('');
  const [to, setTo] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onApply({ action: action || undefined, actor: actor.trim() || undefined, from: dayStart(from), to: dayEnd(to) });
  };
  const field = 'flex flex-col gap-1 text-sm font-medium text-ink-800';
  return (
    <form
      onSubmit={submit}
      aria-label="Filter the audit trail"
      className="flex flex-wrap items-end gap-4 rounded-lg border border-ink-100 bg-white p-4 shadow-sm"
    >
      <label className={field}>
        Action
        <select value={action} onChange={(e) => setAction(e.target.value)} className={inputClass}>
          {actionFamilies.map(([value, label]) => (
            <option key={value} value={value}>
              {label}
            </option>
          ))}
        </select>
      </label>
      <label className={field}>
        Who (e-mail contains)
        <input
          type="search"
          value={actor}
          maxLength={254}
          onChange={(e) => setActor(e.target.value)}
          className={`${inputClass} w-60`}
        />
      </label>
      <label className={field}>
        From (day)
        <input type="date" value={from} onChange={(e) => setFrom(e.target.value)} className={inputClass} />
      </label>
      <label className={field}>
        To (day)
        <input type="date" value={to} onChange={(e) => setTo(e.target.value)} className={inputClass} />
      </label>
      <button type="submit" className={buttonClass.primary}>
        Apply filters
      </button>
    </form>
  );
}
