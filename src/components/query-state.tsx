import type { ReactNode } from 'react';
import { ApiError } from '@/lib/api-client';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" aria-live="polite" className="py-6 text-ink-500">
      {label}
    </p>
  );
}

/** A failed request, said plainly, with the server's issues when it sent any and a retry. */
export function ErrorState({
  error,
  onRetry,
  title = 'This could not be loaded.',
}: {
  error: unknown;
  onRetry?: () => void;
  title?: string;
}) {
  const message = error instanceof Error ? error.message : String(error);
  const signIn = error instanceof ApiError && error.status === 401;
  return (
    <div role="alert" className="rounded border border-brick-600 bg-brick-100 p-4 text-ink-900">
      <p className="font-semibold text-brick-700">{title}</p>
      <p className="mt-1">{signIn ? 'Your session has ended: sign in again.' : message}</p>
      {onRetry && (
        <button type="button" onClick={onRetry} className="mt-3 rounded border border-ink-300 bg-white px-3 py-1 text-sm">
          Try again
        </button>
      )}
    </div>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded border border-dashed border-ink-300 bg-white p-6 text-center">
      <p className="font-medium text-ink-800">{title}</p>
      {children && <div className="mt-2 text-sm text-ink-500">{children}</div>}
    </div>
  );
}
