import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { FormField, describedBy, inputClass } from '@/components/form-field';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { AuthFrame, wideButton } from './auth-frame';
import { fieldError, formError } from './field-errors';

export function ForgotPasswordPage() {
  const [email, setEmail] = useState('');
  const request = useRequestPasswordReset();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    request.mutate(email);
  };
  const emailError = fieldError(request.error, 'email');
  const message = formError(request.error, ['email']);

  return (
    <AuthFrame title="Forgot your password?" intro="We e-mail you a link to choose a new one. It works once, for one hour.">
      {request.isSuccess ? (
        <p role="status" className="rounded border border-seaglass-500 bg-seaglass-100 px-3 py-3 text-ink-900">
          {request.data.message}
        </p>
      ) : (
        <form onSubmit={submit} noValidate className="space-y-5">
          <FormField id="reset-email" label="E-mail address" error={emailError}>
            <input
              id="reset-email"
              type="email"
              autoComplete="username"
              required
              value={email}
              onChange={(e) => setEmail(e.target.value)}
              className={inputClass}
              aria-invalid={!!emailError}
              aria-describedby={describedBy('reset-email', { error: emailError })}
            />
          </FormField>
          {message && (
            <p role="alert" className="rounded border border-brick-600 bg-brick-100 px-3 py-2 text-sm text-brick-700">
              {message}
            </p>
          )}
          <button type="submit" disabled={request.isPending} className={wideButton}>
            {request.isPending ? 'Sending…' : 'Send the link'}
          </button>
        </form>
      )}
      <p className="mt-6 text-sm">
        <Link to="/sign-in" className="font-medium text-seaglass-700 underline underline-offset-2 hover:text-seaglass-600">
          Back to sign-in
        </Link>
      </p>
    </AuthFrame>
  );
}
