import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Battery, BatteryPatch } from '@shared/schemas/battery';
import { api } from '@/lib/api-client';

/** Sends the changed fields with the version read; 409 when someone else saved first. */
export const updateBattery = ({ id, patch }: { id: string; patch: BatteryPatch }) =>
  api.patch<Battery>(`/api/batteries/${encodeURIComponent(id)}`, { ...patch });

export function useUpdateBattery() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateBattery,
    onSuccess: (battery) => {
      queryClient.setQueryData(['batteries', 'detail', battery.id], battery);
      return queryClient.invalidateQueries({ queryKey: ['batteries', 'list', battery.siteId] });
    },
  });
}
