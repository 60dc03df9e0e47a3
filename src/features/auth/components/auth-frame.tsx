import type { FormEvent, ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Logo } from '@/components/logo';
import { Notice } from '@/components/text-field';
import { TideIllustration } from './tide-illustration';

/** The full-width submit button of the pages seen before signing in. */
const wideButton =
  'w-full rounded bg-seaglass-700 px-4 py-2.5 text-base font-semibold text-white hover:bg-seaglass-800 disabled:cursor-not-allowed disabled:opacity-50';

/**
 * The form of a page seen before signing in: its fields, the form-wide error
 * (if any) and one full-width submit button that says when it is working.
 */
export function AuthForm({
  onSubmit,
  error,
  pending,
  submitLabel,
  pendingLabel,
  children,
}: {
  onSubmit: (event: FormEvent) => void;
  error: string | null | undefined;
  pending: boolean;
  submitLabel: string;
  pendingLabel: string;
  children: ReactNode;
}) {
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      {children}
      {error && <Notice tone="error">{error}</Notice>}
      <button type="submit" disabled={pending} className={wideButton}>
        {pending ? pendingLabel : submitLabel}
      </button>
    </form>
  );
}

/** A link between the pages seen before signing in. */
export function FrameLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <Link to={to} className="font-medium text-seaglass-700 underline underline-offset-2 hover:text-seaglass-600">
      {children}
    </Link>
  );
}

/** The frame of the pages seen before signing in: the brand on ink navy, the form on light. */
export function AuthFrame({ title, intro, children }: { title: string; intro?: ReactNode; children: ReactNode }) {
  return (
    <div className="grid min-h-full lg:grid-cols-[minmax(0,5fr)_minmax(0,4fr)]">
      <aside className="relative hidden flex-col justify-between overflow-hidden bg-ink-950 px-12 py-10 text-ink-100 lg:flex">
        <div className="flex items-center gap-3 text-2xl font-semibold tracking-wide text-white">
          <Logo size={36} />
          <span>Slackwater</span>
        </div>
        <div className="space-y-6">
          <TideIllustration />
          <p className="max-w-md text-2xl leading-snug font-medium text-white">
            Dispatch plans that stay near the steady cycle, and a second signature before they leave.
          </p>
          <ul className="max-w-md space-y-1 text-sm text-ink-300">
            <li>
              <span className="mr-2 inline-block h-2 w-5 rounded-full bg-seaglass-500 align-middle" />
              state of charge inside the band
            </li>
            <li>
              <span className="mr-2 inline-block h-2 w-5 rounded-full bg-amber-500 align-middle" />
              leaving arc at the end of the horizon
            </li>
          </ul>
        </div>
        <p className="text-sm text-ink-300">Decision support for storage dispatch. Qualified personnel decide dispatch.</p>
      </aside>
      <main className="flex flex-col justify-center bg-ink-50 px-6 py-10 sm:px-12">
        <div className="mx-auto w-full max-w-sm">
          <div className="mb-8 flex items-center gap-2 text-xl font-semibold text-ink-900 lg:hidden">
            <Logo />
            <span>Slackwater</span>
          </div>
          <h1 className="text-3xl font-semibold text-ink-900">{title}</h1>
          {intro && <div className="mt-2 text-ink-700">{intro}</div>}
          <div className="mt-8">{children}</div>
        </div>
      </main>
    </div>
  );
}
