import { useState } from 'react';
import { inputClass } from '@/components/form-field';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { useOutbox } from '../api/get-outbox';
import { MailMessageView } from './mail-message-view';
import { formatMoment } from '@/lib/format';

/** Admin page: the messages the local fake SMTP server received (development and demo). */
export function MailOutboxPage() {
  const [to, setTo] = useState('');
  const [selected, setSelected] = useState<number | null>(null);
  const outbox = useOutbox(to.trim());

  return (
    <section className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-ink-900">Mail outbox</h1>
        <p className="mt-1 text-ink-700">
          Every e-mail Slackwater sent through the local test mail server: invitations, password links, sign-off notices. Nothing
          here left this machine.
        </p>
      </div>
      <label className="flex max-w-sm flex-col gap-1 text-sm font-medium text-ink-800">
        Recipient contains
        <input type="search" value={to} maxLength={254} onChange={(e) => setTo(e.target.value)} className={inputClass} />
      </label>
      {outbox.isPending && <LoadingState label="Loading the outbox…" />}
      {outbox.isError && <ErrorState error={outbox.error} onRetry={() => void outbox.refetch()} />}
      {outbox.data?.length === 0 && (
        <EmptyState title="No e-mail yet.">Invite a user or ask for a password reset to see one here.</EmptyState>
      )}
      {outbox.data && outbox.data.length > 0 && (
        <div className="grid overflow-hidden rounded-lg border border-ink-100 bg-white shadow-sm lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
          <ul
            aria-label="Messages, newest first"
            className="max-h-[70vh] divide-y divide-ink-100 overflow-y-auto border-ink-100 lg:border-r"
          >
            {outbox.data.map((m) => (
              <li key={m.id}>
                <button
                  type="button"
                  aria-current={selected === m.id ? 'true' : undefined}
                  onClick={() => setSelected(m.id)}
                  className={`block w-full px-4 py-3 text-left hover:bg-ink-50 ${selected === m.id ? 'bg-seaglass-100' : ''}`}
                >
                  <span className="block truncate font-medium text-ink-900">{m.subject || '(no subject)'}</span>
                  <span className="block truncate text-sm text-ink-700">to {m.to}</span>
                  <span className="block text-xs text-ink-500">{formatMoment(m.sentAt)}</span>
                </button>
              </li>
            ))}
          </ul>
          <MailMessageView id={selected} />
        </div>
      )}
    </section>
  );
}
