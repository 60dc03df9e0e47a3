import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Battery, BatteryCreateInput } from '@shared/schemas/battery';
import { api } from '@/lib/api-client';

export const createBattery = ({ siteId, input }: { siteId: string; input: BatteryCreateInput }) =>
  api.post<Battery>(`/api/sites/${encodeURIComponent(siteId)}/batteries`, { ...input });

export function useCreateBattery() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createBattery,
    onSuccess: (battery) => {
      queryClient.setQueryData(['batteries', 'detail', battery.id], battery);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: ['batteries', 'list', battery.siteId] }),
        queryClient.invalidateQueries({ queryKey: ['sites'] }),
      ]);
    },
  });
}
