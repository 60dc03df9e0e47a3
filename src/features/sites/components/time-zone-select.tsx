import { useMemo } from 'react';
import { timeZoneChoices } from '@shared/schemas/site';
import { inputClass } from '@/components/form-field';

/** IANA zones grouped by region (Europe/…, America/…); typing the first letters jumps through a long list. */
export function TimeZoneSelect({
  id,
  value,
  onChange,
  describedBy,
}: {
  id: string;
  value: string;
  onChange: (zone: string) => void;
  describedBy?: string | undefined;
}) {
  const groups = useMemo(() => {
    const byRegion = new Map<string, string[]>();
    for (const zone of timeZoneChoices()) {
      const region = zone.includes('/') ? zone.slice(0, zone.indexOf('/')) : 'Other';
      byRegion.set(region, [...(byRegion.get(region) ?? []), zone]);
    }
    return [...byRegion.entries()];
  }, []);
  const known = groups.some(([, zones]) => zones.includes(value));
  return (
    <select
      id={id}
      className={inputClass}
      value={value}
      onChange={(e) => onChange(e.target.value)}
      aria-describedby={describedBy}
    >
      {!value && <option value="">Choose a time zone…</option>}
      {value && !known && <option value={value}>{value}</option>}
      {groups.map(([region, zones]) => (
        <optgroup key={region} label={region}>
          {zones.map((zone) => (
            <option key={zone} value={zone}>
              {zone}
            </option>
          ))}
        </optgroup>
      ))}
    </select>
  );
}
