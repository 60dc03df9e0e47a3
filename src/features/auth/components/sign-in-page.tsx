import { useState, type FormEvent } from 'react';
import { Link, Navigate, useLocation, useNavigate, useSearchParams } from 'react-router-dom';
import { FormField, describedBy, inputClass } from '@/components/form-field';
import { useMe } from '../api/get-me';
import { useSignIn } from '../api/sign-in';
import { AuthFrame, wideButton } from './auth-frame';
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
        <p role="status" className="mb-6 rounded border border-seaglass-500 bg-seaglass-100 px-3 py-2 text-sm text-ink-900">
          {notice}
        </p>
      )}
      <form onSubmit={submit} noValidate className="space-y-5">
        <FormField id="sign-in-email" label="E-mail address" error={emailError}>
          <input
            id="sign-in-email"
            type="email"
            autoComplete="username"
            required
            value={email}
            onChange={(e) => setEmail(e.target.value)}
            className={inputClass}
            aria-invalid={!!emailError}
            aria-describedby={describedBy('sign-in-email', { error: emailError })}
          />
        </FormField>
        <FormField id="sign-in-password" label="Password" error={passwordError}>
          <input
            id="sign-in-password"
            type="password"
            autoComplete="current-password"
            required
            value={password}
            onChange={(e) => setPassword(e.target.value)}
            className={inputClass}
            aria-invalid={!!passwordError}
            aria-describedby={describedBy('sign-in-password', { error: passwordError })}
          />
        </FormField>
        {message && (
          <p role="alert" className="rounded border border-brick-600 bg-brick-100 px-3 py-2 text-sm text-brick-700">
            {message}
          </p>
        )}
        <button type="submit" disabled={signIn.isPending} className={wideButton}>
          {signIn.isPending ? 'Signing in…' : 'Sign in'}
        </button>
      </form>
      <p className="mt-6 text-sm text-ink-700">
        <Link to="/forgot-password" className="font-medium text-seaglass-700 underline underline-offset-2 hover:text-seaglass-600">
          Forgot your password?
        </Link>
      </p>
    </AuthFrame>
  );
}
