import type { QueryClient } from '@tanstack/react-query';

/** Every sign-off action changes the plan, the plan lists and the pending list: all live under ['plans']. */
export const invalidatePlans = (queryClient: QueryClient) => queryClient.invalidateQueries({ queryKey: ['plans'] });
