import { useState, type FormEvent } from 'react';
import { Notice, TextField } from '@/components/text-field';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { AuthForm, AuthFrame, FrameLink } from './auth-frame';
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
        <AuthForm
          onSubmit={submit}
          error={message}
          pending={request.isPending}
          submitLabel="Send the link"
          pendingLabel="Sending…"
        >
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
        </AuthForm>
      )}
      <p className="mt-6 text-sm">
        <FrameLink to="/sign-in">Back to sign-in</FrameLink>
      </p>
    </AuthFrame>
  );
}
