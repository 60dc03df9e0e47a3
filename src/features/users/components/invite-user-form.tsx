import { useState, type FormEvent } from 'react';
import { roleLabels, roles, type Role } from '@shared/schemas/auth';
import { FormField, buttonClass, inputClass } from '@/components/form-field';
import { TextField } from '@/components/text-field';
import { ApiError } from '@/lib/api-client';
import { useInviteUser } from '../api/invite-user';

const issueFor = (error: unknown, path: string) =>
  error instanceof ApiError
    ? error.issues
        .filter((i) => i.path === path)
        .map((i) => i.message)
        .join(' ') || undefined
    : undefined;

/** Invite someone by e-mail with a role; they choose their password through the link. */
export function InviteUserForm() {
  const invite = useInviteUser();
  const [form, setForm] = useState<{ email: string; name: string; role: Role }>({ email: '', name: '', role: 'viewer' });
  const submit = (event: FormEvent) => {
    event.preventDefault();
    invite.mutate(form, { onSuccess: () => setForm({ email: '', name: '', role: form.role }) });
  };
  const errors = {
    email: issueFor(invite.error, 'email'),
    name: issueFor(invite.error, 'name'),
    role: issueFor(invite.error, 'role'),
  };
  const general = invite.error instanceof ApiError && invite.error.issues.length === 0 ? invite.error.message : undefined;

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby="invite-heading"
      className="rounded-lg border border-ink-100 bg-white p-5 shadow-sm"
    >
      <h2 id="invite-heading" className="text-lg font-semibold text-ink-900">
        Invite a user
      </h2>
      <div className="mt-4 grid gap-4 md:grid-cols-[2fr_2fr_1fr_auto] md:items-start">
        <TextField
          id="invite-email"
          label="E-mail address"
          type="email"
          required
          value={form.email}
          onValue={(email) => setForm({ ...form, email })}
          error={errors.email}
        />
        <TextField
          id="invite-name"
          label="Name"
          required
          maxLength={100}
          value={form.name}
          onValue={(name) => setForm({ ...form, name })}
          error={errors.name}
        />
        <FormField id="invite-role" label="Role" error={errors.role}>
          <select
            id="invite-role"
            value={form.role}
            onChange={(e) => setForm({ ...form, role: e.target.value as Role })}
            className={inputClass}
          >
            {roles.map((r) => (
              <option key={r} value={r}>
                {roleLabels[r]}
              </option>
            ))}
          </select>
        </FormField>
        <button type="submit" disabled={invite.isPending} className={`${buttonClass.primary} md:mt-6`}>
          {invite.isPending ? 'Inviting…' : 'Send invitation'}
        </button>
      </div>
      <div aria-live="polite" className="mt-3 text-sm">
        {general && <p className="text-brick-700">{general}</p>}
        {invite.data && (
          <p className={invite.data.mail === 'sent' ? 'text-seaglass-700' : 'text-amber-700'}>
            {invite.data.mail === 'sent'
              ? `Invitation sent to ${invite.data.user.email}. The link works once, for 72 hours.`
              : `${invite.data.user.email} was added, but the e-mail could not be sent. Use "Send a new link" once mail works.`}
          </p>
        )}
      </div>
    </form>
  );
}
