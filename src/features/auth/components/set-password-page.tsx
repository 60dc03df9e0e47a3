import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { Notice } from '@/components/text-field';
import { usePasswordLink, useRedeemPasswordLink } from '../api/password-links';
import { AuthForm, AuthFrame, FrameLink } from './auth-frame';
import { fieldError, formError } from './field-errors';
import { NewPasswordFields, useNewPasswordForm } from './new-password-fields';
import { formatMoment } from '@/lib/format';

/**
 * The token arrives in the URL fragment (`#token=…`): it is read once and the address bar
 * is cleaned, so it neither reaches the server in a page request nor stays on screen.
 */
function takeToken(): string | null {
  const token = new URLSearchParams(window.location.hash.slice(1)).get('token');
  if (token) window.history.replaceState(window.history.state, '', window.location.pathname);
  return token;
}

export function SetPasswordPage() {
  const [token] = useState(takeToken);
  const link = usePasswordLink(token);
  const redeem = useRedeemPasswordLink();
  const navigate = useNavigate();
  const form = useNewPasswordForm();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!form.check() || !token) return;
    redeem.mutate(
      { token, password: form.value.password },
      {
        onSuccess: () =>
          void navigate('/sign-in', { replace: true, state: { notice: 'Your password is set. Sign in with it now.' } }),
      },
    );
  };

  if (!token || link.isError) {
    const reason = link.error instanceof Error ? link.error.message : 'This page needs the link from your e-mail.';
    return (
      <AuthFrame title="This link does not work">
        <Notice tone="error">{reason}</Notice>
        <p className="mt-6 text-sm text-ink-700">
          <FrameLink to="/forgot-password">Ask for a new link</FrameLink> or, if you were invited, ask your administrator to send
          the invitation again.
        </p>
      </AuthFrame>
    );
  }
  if (!link.data) {
    return (
      <AuthFrame title="Checking your link…">
        <p role="status">One moment.</p>
      </AuthFrame>
    );
  }
  const invite = link.data.purpose === 'invite';
  const message = formError(redeem.error, ['password']);
  return (
    <AuthFrame
      title={invite ? 'Welcome to Slackwater' : 'Choose a new password'}
      intro={
        <>
          {invite ? 'Choose the password for ' : 'For '}
          <strong className="font-semibold text-ink-900">{link.data.email}</strong>. The link expires{' '}
          {formatMoment(link.data.expiresAt)}.
        </>
      }
    >
      <AuthForm
        onSubmit={submit}
        error={message}
        pending={redeem.isPending}
        submitLabel={invite ? 'Set my password' : 'Save the new password'}
        pendingLabel="Saving…"
      >
        <NewPasswordFields
          idPrefix="set"
          value={form.value}
          onChange={form.setValue}
          errors={{ password: form.errors.password ?? fieldError(redeem.error, 'password'), confirm: form.errors.confirm }}
        />
      </AuthForm>
    </AuthFrame>
  );
}
