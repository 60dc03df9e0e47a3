/**
 * The inputs every plan and horizon study starts from: a site, one of its
 * batteries and its profiles (price required, load and generation optional).
 * Shared by the plan and study forms; reads the same lists (and query keys)
 * as the site, battery and profile pages.
 */
import { useQuery } from '@tanstack/react-query';
import type { Site } from '@shared/schemas/site';
import type { Battery } from '@shared/schemas/battery';
import type { ProfileSummary } from '@shared/schemas/profile';
import { api } from '@/lib/api-client';
import { formatLocalTime } from '@/lib/format';
import { FormField, describedBy, inputClass } from './form-field';

export interface RunSource {
  siteId: string;
  batteryId: string;
  priceProfileId: string;
  loadProfileId: string;
  generationProfileId: string;
}

export const emptyRunSource: RunSource = {
  siteId: '',
  batteryId: '',
  priceProfileId: '',
  loadProfileId: '',
  generationProfileId: '',
};

export function useRunSourceLists(siteId: string) {
  const sites = useQuery({ queryKey: ['sites', 'list'], queryFn: () => api.get<Site[]>('/api/sites') });
  const batteries = useQuery({
    queryKey: ['batteries', 'list', siteId],
    queryFn: () => api.get<Battery[]>(`/api/sites/${siteId}/batteries`),
    enabled: !!siteId,
  });
  const profiles = useQuery({
    queryKey: ['profiles', 'list', siteId],
    queryFn: () => api.get<ProfileSummary[]>(`/api/sites/${siteId}/profiles`),
    enabled: !!siteId,
  });
  return { sites, batteries, profiles };
}

interface Props {
  value: RunSource;
  onChange: (next: RunSource) => void;
  errors: Record<string, string>;
}

/** Name, period in the site's local dates (UTC dates would show 2025-12-31 for a profile starting on 1 January at 00:00 +01:00), step. */
const profileLabel = (p: ProfileSummary, timeZone: string) =>
  `${p.name} (${formatLocalTime(Date.parse(p.start), timeZone).slice(0, 10)} – ${formatLocalTime(Date.parse(p.end), timeZone).slice(0, 10)}, ${p.stepMinutes} min)`;

export function RunSourceFields({ value, onChange, errors }: Props) {
  const { sites, batteries, profiles } = useRunSourceLists(value.siteId);
  const byKind = (kind: ProfileSummary['kind']) => (profiles.data ?? []).filter((p) => p.kind === kind);
  const timeZone = sites.data?.find((s) => s.id === value.siteId)?.timezone ?? 'UTC';
  const select = (
    id: keyof RunSource,
    label: string,
    options: { id: string; label: string }[],
    optional: boolean,
    hint?: string,
  ) => (
    <FormField id={id} label={label} error={errors[id]} hint={hint}>
      <select
        id={id}
        className={inputClass}
        value={value[id]}
        aria-invalid={!!errors[id]}
        aria-describedby={describedBy(id, { error: errors[id], hint })}
        onChange={(e) => {
          const next = { ...value, [id]: e.target.value };
          // A different site means different batteries and profiles.
          onChange(id === 'siteId' ? { ...emptyRunSource, siteId: e.target.value } : next);
        }}
      >
        <option value="">{optional ? 'None' : 'Choose…'}</option>
        {options.map((o) => (
          <option key={o.id} value={o.id}>
            {o.label}
          </option>
        ))}
      </select>
    </FormField>
  );
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      {select(
        'siteId',
        'Site',
        (sites.data ?? []).map((s) => ({ id: s.id, label: `${s.name} (${s.timezone})` })),
        false,
      )}
      {select(
        'batteryId',
        'Battery',
        (batteries.data ?? []).map((b) => ({ id: b.id, label: `${b.name} (${b.powerDischargeKw} kW / ${b.energyKwh} kWh)` })),
        false,
      )}
      {select(
        'priceProfileId',
        'Price profile',
        byKind('price').map((p) => ({ id: p.id, label: profileLabel(p, timeZone) })),
        false,
      )}
      {select(
        'loadProfileId',
        'Load profile',
        byKind('load').map((p) => ({ id: p.id, label: profileLabel(p, timeZone) })),
        true,
        'Leave empty for pure arbitrage.',
      )}
      {select(
        'generationProfileId',
        'Generation profile',
        byKind('generation').map((p) => ({ id: p.id, label: profileLabel(p, timeZone) })),
        true,
      )}
    </div>
  );
}

/** A site filter for lists: "All sites" or one of them. */
export function SiteFilter({ value, onChange }: { value: string; onChange: (siteId: string) => void }) {
  const { sites } = useRunSourceLists('');
  return (
    <label className="text-sm">
      Site
      <select className={inputClass} value={value} onChange={(e) => onChange(e.target.value)}>
        <option value="">All sites</option>
        {(sites.data ?? []).map((s) => (
          <option key={s.id} value={s.id}>
            {s.name}
          </option>
        ))}
      </select>
    </label>
  );
}
