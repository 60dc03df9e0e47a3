import { useQueries } from '@tanstack/react-query';
import { getPlanQueryOptions } from './get-plan';

/** Several plans in full (results included), each polling while its job runs. */
export const usePlanDetails = (ids: readonly string[]) => useQueries({ queries: ids.map((id) => getPlanQueryOptions(id)) });
