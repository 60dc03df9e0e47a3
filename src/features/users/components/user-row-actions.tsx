import { roleLabels, roles, type Role } from '@shared/schemas/auth';
import type { User } from '@shared/schemas/users';
import { buttonClass } from '@/components/form-field';
import { useUpdateUser } from '../api/update-user';
import { useResendInvitation } from '../api/resend-invitation';

/** The server refuses this too; the page says why before anyone tries. */
const lastAdminHint = 'The last active admin cannot be demoted or disabled: make another user admin first.';

/** An admin account that is not disabled; the server counts these for the last-admin rule. */
export const isActiveAdmin = (u: User) => u.role === 'admin' && u.status !== 'disabled';

/** Errors from row actions (e.g. "last active admin") go to one live region above the table. */
export type ReportOutcome = (message: string, tone: 'ok' | 'error') => void;

export function RoleSelect({ user, report, lastAdmin }: { user: User; report: ReportOutcome; lastAdmin: boolean }) {
  const update = useUpdateUser();
  const change = (role: Role) =>
    update.mutate(
      { id: user.id, role },
      {
        onSuccess: () => report(`${user.email} is now ${roleLabels[role].toLowerCase()}.`, 'ok'),
        onError: (e) => report(e.message, 'error'),
      },
    );
  return (
    <select
      aria-label={`Role of ${user.email}`}
      value={user.role}
      disabled={update.isPending || lastAdmin}
      title={lastAdmin ? lastAdminHint : undefined}
      onChange={(e) => change(e.target.value as Role)}
      className="rounded border border-ink-300 bg-white px-2 py-1 text-sm"
    >
      {roles.map((r) => (
        <option key={r} value={r}>
          {roleLabels[r]}
        </option>
      ))}
    </select>
  );
}

export function UserActions({ user, report, lastAdmin }: { user: User; report: ReportOutcome; lastAdmin: boolean }) {
  const update = useUpdateUser();
  const resend = useResendInvitation();
  const disabled = user.status === 'disabled';
  const toggle = () =>
    update.mutate(
      { id: user.id, disabled: !disabled },
      {
        onSuccess: () =>
          report(disabled ? `${user.email} can sign in again.` : `${user.email} is disabled and was signed out.`, 'ok'),
        onError: (e) => report(e.message, 'error'),
      },
    );
  const sendLink = () =>
    resend.mutate(user.id, {
      onSuccess: (r) =>
        report(
          r.mail === 'sent' ? `A new invitation link went to ${user.email}.` : 'The e-mail could not be sent.',
          r.mail === 'sent' ? 'ok' : 'error',
        ),
      onError: (e) => report(e.message, 'error'),
    });
  return (
    <div className="flex flex-wrap gap-2">
      {user.status === 'invited' && (
        <button
          type="button"
          onClick={sendLink}
          disabled={resend.isPending}
          className={buttonClass.secondary.replace('px-4 py-2', 'px-3 py-1')}
        >
          Send a new link<span className="sr-only"> to {user.email}</span>
        </button>
      )}
      <button
        type="button"
        onClick={toggle}
        disabled={update.isPending || lastAdmin}
        title={lastAdmin ? lastAdminHint : undefined}
        className={
          disabled
            ? buttonClass.secondary.replace('px-4 py-2', 'px-3 py-1')
            : buttonClass.danger.replace('px-3 py-1.5', 'px-3 py-1')
        }
      >
        {disabled ? 'Enable' : 'Disable'}
        <span className="sr-only"> {user.email}</span>
      </button>
    </div>
  );
}
