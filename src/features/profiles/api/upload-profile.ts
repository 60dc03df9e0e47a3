import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProfileSummary } from '@shared/schemas/profile';
import type { DateOrder, DecimalSeparator, ProfileKind } from '@shared/profile-csv';
import { api } from '@/lib/api-client';

export interface UploadProfileInput {
  siteId: string;
  file: File;
  kind: ProfileKind;
  unit: string;
  name?: string;
  intervalEnding: boolean;
  fillGaps: boolean;
  /** Left out when the file writes ISO 8601 dates / plain numbers. */
  dateOrder?: DateOrder | undefined;
  decimalSeparator?: DecimalSeparator | undefined;
}

/** multipart/form-data with the API's field names; a 422 carries `{issues:[{line,message}], hint}`. */
export function uploadProfile(input: UploadProfileInput) {
  const form = new FormData();
  form.append('kind', input.kind);
  form.append('unit', input.unit);
  if (input.name) form.append('name', input.name);
  form.append('intervalEnding', String(input.intervalEnding));
  form.append('fillGaps', String(input.fillGaps));
  if (input.dateOrder) form.append('dateOrder', input.dateOrder);
  if (input.decimalSeparator) form.append('decimalSeparator', input.decimalSeparator);
  form.append('file', input.file, input.file.name);
  return api.post<ProfileSummary>(`/api/sites/${encodeURIComponent(input.siteId)}/profiles`, form);
}

export function useUploadProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadProfile,
    onSuccess: (profile) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['profiles', 'list', profile.siteId] }),
        queryClient.invalidateQueries({ queryKey: ['sites'] }),
      ]),
  });
}
