import { useState } from 'react';
import type { ApiToken } from '@shared/schemas/tokens';
import { buttonClass } from '@/components/form-field';
import { EmptyState } from '@/components/query-state';
import { formatMoment } from '@/lib/format';
import { useRevokeToken } from '../api/revoke-token';

function RevokeButton({ token }: { token: ApiToken }) {
  const revoke = useRevokeToken();
  const [confirming, setConfirming] = useState(false);
  if (!confirming) {
    return (
      <button
        type="button"
        className={buttonClass.danger}
        onClick={() => setConfirming(true)}
        aria-label={`Revoke ${token.name}`}
      >
        Revoke
      </button>
    );
  }
  return (
    <span className="flex flex-wrap items-center gap-2">
      <button type="button" className={buttonClass.danger} disabled={revoke.isPending} onClick={() => revoke.mutate(token.id)}>
        {revoke.isPending ? 'Revoking…' : 'Revoke now'}
      </button>
      <button type="button" className="text-sm text-ink-700 underline" onClick={() => setConfirming(false)}>
        Keep it
      </button>
      {revoke.isError && (
        <span role="alert" className="text-sm text-brick-700">
          {revoke.error.message}
        </span>
      )}
    </span>
  );
}

/** Tokens with their expiry and last use; a revoked token stops working at once. */
export function TokenTable({ tokens, caption }: { tokens: readonly ApiToken[]; caption: string }) {
  if (tokens.length === 0) return <EmptyState title="No tokens yet." />;
  const now = Date.now();
  return (
    <div
      className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm"
      tabIndex={0}
      role="region"
      aria-label={caption}
    >
      <table className="w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-ink-50 text-ink-700">
          <tr>
            {['Name', 'Created', 'Expires', 'Last used', ''].map((h, i) => (
              <th key={i} scope="col" className={`px-4 py-2 font-semibold ${h === 'Created' ? 'hidden md:table-cell' : ''}`}>
                {h || <span className="sr-only">Actions</span>}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {tokens.map((t) => {
            const expired = Date.parse(t.expiresAt) <= now;
            return (
              <tr key={t.id} className="border-t border-ink-100 align-top">
                <td className="px-4 py-2 font-medium text-ink-900">{t.name}</td>
                <td className="hidden px-4 py-2 whitespace-nowrap tabular-nums md:table-cell">{formatMoment(t.createdAt)}</td>
                <td className="px-4 py-2 whitespace-nowrap tabular-nums">
                  {expired ? (
                    <span className="font-semibold text-brick-700">Expired {formatMoment(t.expiresAt)}</span>
                  ) : (
                    formatMoment(t.expiresAt)
                  )}
                </td>
                <td className="px-4 py-2">
                  {t.lastUsedAt ? (
                    <>
                      <span className="whitespace-nowrap tabular-nums">{formatMoment(t.lastUsedAt)}</span>
                      <span className="block font-mono text-xs text-ink-500">from {t.lastUsedIp ?? 'unknown'}</span>
                    </>
                  ) : (
                    <span className="text-ink-500">Never</span>
                  )}
                </td>
                <td className="px-4 py-2 text-right">
                  <RevokeButton token={t} />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
