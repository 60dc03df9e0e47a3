import { useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import type { CreatedToken } from '@shared/schemas/tokens';
import { ErrorState, LoadingState } from '@/components/query-state';
import { useCan } from '@/lib/authorization';
import { useTokens } from '../api/get-tokens';
import { CreateTokenForm } from './create-token-form';
import { NewTokenSecret } from './new-token-secret';
import { ServiceUsersSection } from './service-users-section';
import { TokenTable } from './token-table';

/** Settings → API tokens: your tokens (create, copy once, revoke), and for admins the service users. */
export function TokensPage() {
  const tokens = useTokens();
  const isAdmin = useCan('users.manage');
  const [created, setCreated] = useState<CreatedToken | null>(null);
  const queryClient = useQueryClient();
  // Hiding the secret also reloads the lists, so a first use made meanwhile shows.
  const done = () => {
    setCreated(null);
    void queryClient.invalidateQueries({ queryKey: ['tokens'] });
    void queryClient.invalidateQueries({ queryKey: ['service-users'] });
  };
  return (
    <section className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold text-ink-900">API tokens</h1>
        <p className="mt-1 max-w-3xl text-ink-700">
          A token lets a program call the Slackwater API as you, with your role. Send it as{' '}
          <code className="rounded bg-ink-100 px-1 font-mono text-sm">Authorization: Bearer &lt;token&gt;</code>, never in a URL.
          Revoke a token as soon as it is no longer needed or may have leaked. The operations are listed in the{' '}
          <Link to="/api-docs" className="font-medium text-seaglass-800 underline">
            API reference
          </Link>
          .
        </p>
      </div>
      {created && <NewTokenSecret created={created} onDone={done} />}
      <section aria-labelledby="own-tokens-heading" className="space-y-4">
        <h2 id="own-tokens-heading" className="text-xl font-semibold text-ink-900">
          Your tokens
        </h2>
        <div className="rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
          <CreateTokenForm idPrefix="own-token" onCreated={setCreated} />
        </div>
        {tokens.isPending && <LoadingState label="Loading your tokens…" />}
        {tokens.isError && <ErrorState error={tokens.error} onRetry={() => void tokens.refetch()} />}
        {tokens.data && <TokenTable tokens={tokens.data} caption="Your API tokens" />}
      </section>
      {isAdmin && <ServiceUsersSection onCreated={setCreated} />}
    </section>
  );
}
