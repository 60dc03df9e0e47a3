import { useState, type FormEvent } from 'react';
import { TOKEN_LIFETIME_DAYS, type CreatedToken } from '@shared/schemas/tokens';
import { FormField, buttonClass, inputClass } from '@/components/form-field';
import { TextField } from '@/components/text-field';
import { ApiError } from '@/lib/api-client';
import { useCreateToken } from '../api/create-token';

const lifetimes = [7, 30, TOKEN_LIFETIME_DAYS.default, 180, TOKEN_LIFETIME_DAYS.max];

const issueFor = (error: unknown, path: string) =>
  error instanceof ApiError ? error.issues.find((i) => i.path === path)?.message : undefined;

/** Name and lifetime of a new token, for yourself or (admins) for a service user. */
export function CreateTokenForm({
  idPrefix,
  serviceUserId,
  onCreated,
}: {
  idPrefix: string;
  serviceUserId?: string;
  onCreated: (created: CreatedToken) => void;
}) {
  const create = useCreateToken();
  const [name, setName] = useState('');
  const [days, setDays] = useState<number>(TOKEN_LIFETIME_DAYS.default);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    create.mutate(
      { name, expiresInDays: days, ...(serviceUserId ? { serviceUserId } : {}) },
      {
        onSuccess: (created) => {
          setName('');
          onCreated(created);
        },
      },
    );
  };
  const general = create.error instanceof ApiError && create.error.issues.length === 0 ? create.error.message : undefined;
  return (
    <form onSubmit={submit} noValidate className="grid gap-4 md:grid-cols-[3fr_1fr_auto] md:items-start">
      <TextField
        id={`${idPrefix}-name`}
        label="Token name"
        hint="Say what uses it, e.g. “nightly forecast push”."
        required
        maxLength={80}
        value={name}
        onValue={setName}
        error={issueFor(create.error, 'name')}
      />
      <FormField id={`${idPrefix}-days`} label="Expires after" error={issueFor(create.error, 'expiresInDays')}>
        <select id={`${idPrefix}-days`} value={days} onChange={(e) => setDays(Number(e.target.value))} className={inputClass}>
          {lifetimes.map((d) => (
            <option key={d} value={d}>
              {d === 365 ? '1 year' : `${d} days`}
            </option>
          ))}
        </select>
      </FormField>
      <button type="submit" disabled={create.isPending} className={`${buttonClass.primary} md:mt-6`}>
        {create.isPending ? 'Creating…' : 'Create token'}
      </button>
      {general && (
        <p role="alert" className="text-sm text-brick-700 md:col-span-3">
          {general}
        </p>
      )}
    </form>
  );
}
