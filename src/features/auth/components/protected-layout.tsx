import { useEffect } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { useQueryClient } from '@tanstack/react-query';
import { can, type Action } from '@shared/schemas/auth';
import { AppShell, type NavItem } from '@/components/app-shell';
import { ErrorState, LoadingState } from '@/components/query-state';
import { ApiError } from '@/lib/api-client';
import { meQueryKey } from '@/lib/authorization';
import { useMe } from '../api/get-me';
import { AccountMenu } from './account-menu';

export interface RoleNavItem extends NavItem {
  /** Shown only to roles that may do this. */
  action: Action;
}

/**
 * Everything behind sign-in: anonymous visitors go to /sign-in (and come back afterwards),
 * the navigation shows only what the role may use, and a 401 from any request (session
 * ended elsewhere, idle timeout) sends the user back to sign in.
 */
export function ProtectedLayout({ nav }: { nav: readonly RoleNavItem[] }) {
  const me = useMe();
  const location = useLocation();
  const queryClient = useQueryClient();

  useEffect(
    () =>
      queryClient.getQueryCache().subscribe((event) => {
        const error = event.query.state.error;
        if (event.type === 'updated' && error instanceof ApiError && error.status === 401 && event.query.queryKey[0] !== 'auth') {
          queryClient.setQueryData(meQueryKey, null);
        }
      }),
    [queryClient],
  );

  if (me.isPending) {
    return (
      <div className="grid min-h-full place-items-center">
        <LoadingState label="Loading Slackwater…" />
      </div>
    );
  }
  if (me.isError) {
    return (
      <div className="mx-auto max-w-xl p-8">
        <ErrorState error={me.error} onRetry={() => void me.refetch()} title="Slackwater cannot reach its server." />
      </div>
    );
  }
  if (!me.data) {
    const next = `${location.pathname}${location.search}`;
    return <Navigate to={next === '/' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(next)}`} replace />;
  }
  const role = me.data.role;
  const items = nav.filter((item) => can(role, item.action)).map(({ to, label }) => ({ to, label }));
  return <AppShell nav={items} accountMenu={<AccountMenu user={me.data} />} />;
}
