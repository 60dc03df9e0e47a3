import { useState, type FormEvent } from 'react';
import { buttonClass } from '@/components/form-field';
import { Notice, TextField } from '@/components/text-field';
import { useChangePassword } from '../api/change-password';
import { fieldError, formError } from './field-errors';
import { NewPasswordFields, useNewPasswordForm } from './new-password-fields';

/** Change one's own password; every other session of the account ends. */
export function ChangePasswordPage() {
  const change = useChangePassword();
  const [current, setCurrent] = useState('');
  const form = useNewPasswordForm();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!form.check()) return;
    change.mutate(
      { currentPassword: current, newPassword: form.value.password },
      {
        onSuccess: () => {
          setCurrent('');
          form.reset();
        },
      },
    );
  };
  const currentError = fieldError(change.error, 'currentPassword');
  const message = formError(change.error, ['currentPassword', 'newPassword']);

  return (
    <section className="max-w-md space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-ink-900">Change your password</h1>
        <p className="mt-1 text-ink-700">Other browsers signed in to your account are signed out.</p>
      </div>
      {change.isSuccess && <Notice tone="success">Your password is changed. Other sessions were ended.</Notice>}
      <form onSubmit={submit} noValidate className="space-y-5 rounded-lg border border-ink-100 bg-white p-6 shadow-sm">
        <TextField
          id="current-password"
          label="Current password"
          type="password"
          autoComplete="current-password"
          required
          value={current}
          onValue={setCurrent}
          error={currentError}
        />
        <NewPasswordFields
          idPrefix="change"
          value={form.value}
          onChange={form.setValue}
          errors={{ password: form.errors.password ?? fieldError(change.error, 'newPassword'), confirm: form.errors.confirm }}
        />
        {message && <Notice tone="error">{message}</Notice>}
        <button type="submit" disabled={change.isPending} className={buttonClass.primary}>
          {change.isPending ? 'Saving…' : 'Change password'}
        </button>
      </form>
    </section>
  );
}
