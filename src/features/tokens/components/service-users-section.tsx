import { useState, type FormEvent } from 'react';
import { roleLabels, roles, type Role } from '@shared/schemas/auth';
import type { CreatedToken, ServiceUser } from '@shared/schemas/tokens';
import { FormField, buttonClass, inputClass } from '@/components/form-field';
import { TextField } from '@/components/text-field';
import { ErrorState, LoadingState } from '@/components/query-state';
import { ApiError } from '@/lib/api-client';
import { useCreateServiceUser, useServiceUsers, useSetServiceUserDisabled } from '../api/service-users';
import { CreateTokenForm } from './create-token-form';
import { TokenTable } from './token-table';

function CreateServiceUserForm() {
  const create = useCreateServiceUser();
  const [name, setName] = useState('');
  const [role, setRole] = useState<Role>('planner');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    create.mutate({ name, role }, { onSuccess: () => setName('') });
  };
  const nameError = create.error instanceof ApiError ? create.error.issues.find((i) => i.path === 'name')?.message : undefined;
  return (
    <form onSubmit={submit} noValidate className="grid gap-4 md:grid-cols-[3fr_1fr_auto] md:items-start">
      <TextField
        id="service-name"
        label="Service user name"
        required
        maxLength={100}
        value={name}
        onValue={setName}
        error={nameError}
        hint="e.g. “Forecast pipeline”."
      />
      <FormField id="service-role" label="Role">
        <select id="service-role" value={role} onChange={(e) => setRole(e.target.value as Role)} className={inputClass}>
          {roles.map((r) => (
            <option key={r} value={r}>
              {roleLabels[r]}
            </option>
          ))}
        </select>
      </FormField>
      <button type="submit" disabled={create.isPending} className={`${buttonClass.primary} md:mt-6`}>
        {create.isPending ? 'Creating…' : 'Create service user'}
      </button>
    </form>
  );
}

function ServiceUserCard({ user, onCreated }: { user: ServiceUser; onCreated: (created: CreatedToken) => void }) {
  const toggle = useSetServiceUserDisabled();
  return (
    <article aria-labelledby={`service-${user.id}`} className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h3 id={`service-${user.id}`} className="text-base font-semibold text-ink-900">
            {user.name}{' '}
            <span className="ml-1 rounded bg-ink-100 px-2 py-0.5 text-xs font-medium text-ink-700">{roleLabels[user.role]}</span>
            {user.disabled && (
              <span className="ml-1 rounded bg-brick-100 px-2 py-0.5 text-xs font-medium text-brick-700">Disabled</span>
            )}
          </h3>
          <p className="font-mono text-xs text-ink-500 break-all">{user.email}</p>
        </div>
        <button
          type="button"
          className={user.disabled ? buttonClass.secondary : buttonClass.danger}
          disabled={toggle.isPending}
          onClick={() => toggle.mutate({ id: user.id, disabled: !user.disabled })}
        >
          {user.disabled ? 'Enable' : 'Disable (revokes its tokens)'}
        </button>
      </header>
      {toggle.isError && (
        <p role="alert" className="text-sm text-brick-700">
          {toggle.error.message}
        </p>
      )}
      <TokenTable tokens={user.tokens} caption={`Tokens of ${user.name}`} />
      {!user.disabled && <CreateTokenForm idPrefix={`service-${user.id}-token`} serviceUserId={user.id} onCreated={onCreated} />}
    </article>
  );
}

/** Admins: accounts for programs. They have a role but no password, and act only through their tokens. */
export function ServiceUsersSection({ onCreated }: { onCreated: (created: CreatedToken) => void }) {
  const users = useServiceUsers(true);
  return (
    <section aria-labelledby="service-users-heading" className="space-y-4">
      <div>
        <h2 id="service-users-heading" className="text-xl font-semibold text-ink-900">
          Service users
        </h2>
        <p className="mt-1 text-sm text-ink-700">
          For pipelines and other programs: a name and a role, no password and no sign-in. Their actions are audited under their
          own name, via the token they used.
        </p>
      </div>
      <div className="rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
        <CreateServiceUserForm />
      </div>
      {users.isPending && <LoadingState label="Loading service users…" />}
      {users.isError && <ErrorState error={users.error} onRetry={() => void users.refetch()} />}
      {users.data?.map((u) => (
        <ServiceUserCard key={u.id} user={u} onCreated={onCreated} />
      ))}
    </section>
  );
}
