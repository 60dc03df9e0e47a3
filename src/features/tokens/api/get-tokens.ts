import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ApiToken } from '@shared/schemas/tokens';
import { api } from '@/lib/api-client';

export const getTokens = () => api.get<ApiToken[]>('/api/tokens');

export const getTokensQueryOptions = () => queryOptions({ queryKey: ['tokens', 'list'], queryFn: getTokens });

export const useTokens = () => useQuery(getTokensQueryOptions());
