/** `GET|POST /api/service-users`, and disabling one through `PATCH /api/users/:id` (admins). */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ServiceUser, ServiceUserCreateInput } from '@shared/schemas/tokens';
import { api } from '@/lib/api-client';

export const getServiceUsers = () => api.get<ServiceUser[]>('/api/service-users');

export const getServiceUsersQueryOptions = () => queryOptions({ queryKey: ['service-users', 'list'], queryFn: getServiceUsers });

export const useServiceUsers = (enabled: boolean) => useQuery({ ...getServiceUsersQueryOptions(), enabled });

export const createServiceUser = (body: ServiceUserCreateInput) => api.post<ServiceUser>('/api/service-users', { ...body });

export function useCreateServiceUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createServiceUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['service-users'] }),
  });
}

export const setServiceUserDisabled = ({ id, disabled }: { id: string; disabled: boolean }) =>
  api.patch<unknown>(`/api/users/${encodeURIComponent(id)}`, { disabled });

export function useSetServiceUserDisabled() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setServiceUserDisabled,
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['service-users'] }),
  });
}
