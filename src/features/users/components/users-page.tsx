import { useCallback, useState } from 'react';
import { ErrorState, LoadingState } from '@/components/query-state';
import { useUsers } from '../api/get-users';
import { InviteUserForm } from './invite-user-form';
import { UsersTable } from './users-table';
import type { ReportOutcome } from './user-row-actions';

/** Admin page: invite users, change roles, disable accounts. */
export function UsersPage() {
  const users = useUsers();
  const [outcome, setOutcome] = useState<{ message: string; tone: 'ok' | 'error' } | null>(null);
  const report = useCallback<ReportOutcome>((message, tone) => setOutcome({ message, tone }), []);

  return (
    <section className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-ink-900">Users</h1>
        <p className="mt-1 text-ink-700">Who may sign in, and with which role. At least one active admin always remains.</p>
      </div>
      <InviteUserForm />
      <div aria-live="polite">
        {outcome && (
          <p
            role={outcome.tone === 'error' ? 'alert' : 'status'}
            className={`rounded border px-3 py-2 text-sm ${outcome.tone === 'error' ? 'border-brick-600 bg-brick-100 text-brick-700' : 'border-seaglass-500 bg-seaglass-100 text-ink-900'}`}
          >
            {outcome.message}
          </p>
        )}
      </div>
      {users.isPending && <LoadingState label="Loading users…" />}
      {users.isError && <ErrorState error={users.error} onRetry={() => void users.refetch()} />}
      {users.data && <UsersTable users={users.data} report={report} />}
    </section>
  );
}
