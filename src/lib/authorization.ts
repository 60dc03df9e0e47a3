/**
 * Role checks for the browser, usable from any feature (features do not import each
 * other). They read the signed-in user that the protected layout loaded under
 * ['auth','me']; they only hide what the server would refuse anyway.
 *
 *   const canEdit = useCan('data.edit');          // planner, admin
 *   {canApprove && <button>Approve</button>}      // useCan('plans.approve'): approver, admin
 */
import { useQuery } from '@tanstack/react-query';
import { can, type Action, type AuthUser, type Role } from '@shared/schemas/auth';

export const meQueryKey = ['auth', 'me'] as const;

/** The signed-in user, or null; never fetches by itself (the protected layout does). */
export function useSignedInUser(): AuthUser | null {
  const { data } = useQuery<AuthUser | null>({ queryKey: meQueryKey, enabled: false, staleTime: Infinity });
  return data ?? null;
}

export function useRole(): Role | null {
  return useSignedInUser()?.role ?? null;
}

/** True when the signed-in user's role may do `action`. */
export function useCan(action: Action): boolean {
  return can(useRole(), action);
}
