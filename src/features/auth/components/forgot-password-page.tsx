import { useState, type FormEvent } from 'react';
import { Notice, TextField } from '@/components/text-field';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { AuthFrame, FrameLink, wideButton } from './auth-frame';
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
        <Notice tone="success">{request.data.message}</Notice>
      ) : (
        <form onSubmit={submit} noValidate className="space-y-5">
          <TextField
            id="reset-email"
            label="E-mail address"
            type="email"
            autoComplete="username"
            required
            value={email}
            onValue={setEmail}
            error={emailError}
          />
          {message && <Notice tone="error">{message}</Notice>}
          <button type="submit" disabled={request.isPending} className={wideButton}>
            {request.isPending ? 'Sending…' : 'Send the link'}
          </button>
        </form>
      )}
      <p className="mt-6 text-sm">
        <FrameLink to="/sign-in">Back to sign-in</FrameLink>
      </p>
    </AuthFrame>
  );
}
