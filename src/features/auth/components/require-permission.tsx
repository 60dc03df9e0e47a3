import type { ReactNode } from 'react';
import type { Action } from '@shared/schemas/auth';
import { useCan } from '@/lib/authorization';

/** A page only some roles may open; others read why instead (the server refuses them anyway). */
export function RequirePermission({ action, children }: { action: Action; children: ReactNode }) {
  if (useCan(action)) return children;
  return (
    <section role="alert" className="max-w-xl rounded-lg border border-ink-100 bg-white p-6">
      <h1 className="text-xl font-semibold text-ink-900">Not available for your role</h1>
      <p className="mt-2 text-ink-700">Ask an administrator if you need access to this page.</p>
    </section>
  );
}
