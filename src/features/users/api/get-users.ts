import { queryOptions, useQuery } from '@tanstack/react-query';
import type { User } from '@shared/schemas/users';
import { api } from '@/lib/api-client';

export const getUsers = async () => (await api.get<{ users: User[] }>('/api/users')).users;

export const getUsersQueryOptions = () => queryOptions({ queryKey: ['users', 'list'], queryFn: getUsers });

export const useUsers = () => useQuery(getUsersQueryOptions());
