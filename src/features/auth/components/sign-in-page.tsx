import { useState, type FormEvent } from 'react';
import { Navigate, useLocation, useNavigate, useSearchParams } from 'react-router-dom';
import { Notice, TextField } from '@/components/text-field';
import { useMe } from '../api/get-me';
import { useSignIn } from '../api/sign-in';
import { AuthForm, AuthFrame, FrameLink } from './auth-frame';
import { fieldError, formError, safeNextPath } from './field-errors';

export function SignInPage() {
  const [params] = useSearchParams();
  const location = useLocation();
  const navigate = useNavigate();
  const me = useMe();
  const signIn = useSignIn();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const next = safeNextPath(params.get('next'));
  const notice = (location.state as { notice?: string } | null)?.notice;

  if (me.data) return <Navigate to={next} replace />;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    signIn.mutate({ email, password }, { onSuccess: () => void navigate(next, { replace: true }) });
  };
  const emailError = fieldError(signIn.error, 'email');
  const passwordError = fieldError(signIn.error, 'password');
  const message = formError(signIn.error, ['email', 'password']);

  return (
    <AuthFrame title="Sign in" intro="Plan, check and sign off battery dispatch schedules.">
      {notice && (
        <div className="mb-6">
          <Notice tone="success">{notice}</Notice>
        </div>
      )}
      <AuthForm onSubmit={submit} error={message} pending={signIn.isPending} submitLabel="Sign in" pendingLabel="Signing in…">
        <TextField
          id="sign-in-email"
          label="E-mail address"
          type="email"
          autoComplete="username"
          required
          value={email}
          onValue={setEmail}
          error={emailError}
        />
        <TextField
          id="sign-in-password"
          label="Password"
          type="password"
          autoComplete="current-password"
          required
          value={password}
          onValue={setPassword}
          error={passwordError}
        />
      </AuthForm>
      <p className="mt-6 text-sm text-ink-700">
        <FrameLink to="/forgot-password">Forgot your password?</FrameLink>
      </p>
    </AuthFrame>
  );
}
