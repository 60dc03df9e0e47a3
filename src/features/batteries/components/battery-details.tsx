import { BATTERY_FIELD_LABELS, type Battery, type BatteryParams } from '@shared/schemas/battery';
import { WarningNote } from '@/components/form-field';
import { formatEfficiency, formatNumber } from '@/lib/format';

const EFFICIENCIES: readonly (keyof BatteryParams)[] = ['efficiencyCharge', 'efficiencyDischarge'];

/** One parameter as the battery page and the site's battery list both state it (efficiencies in %). */
function shownValue(battery: Battery, key: keyof BatteryParams, currency: string): string {
  const value = battery[key];
  if (value === null) return 'none';
  if (EFFICIENCIES.includes(key)) return formatEfficiency(value);
  return `${formatNumber(value, 4)} ${BATTERY_FIELD_LABELS[key].unit.replace('currency', currency)}`;
}

/** Every parameter with its unit, the round trip, and the warnings in amber: the read-only view of a battery. */
export function BatteryDetails({ battery, currency }: { battery: Battery; currency: string }) {
  const keys = Object.keys(BATTERY_FIELD_LABELS) as (keyof BatteryParams)[];
  const rows: [string, string][] = keys.map((key) => [BATTERY_FIELD_LABELS[key].label, shownValue(battery, key, currency)]);
  const at = rows.findIndex(([label]) => label === BATTERY_FIELD_LABELS.efficiencyDischarge.label);
  rows.splice(at + 1, 0, ['Round-trip efficiency', formatEfficiency(battery.efficiencyCharge * battery.efficiencyDischarge)]);
  return (
    <div className="space-y-3">
      <dl className="grid grid-cols-1 gap-x-6 gap-y-2 rounded bg-white p-4 shadow-sm sm:grid-cols-3">
        {rows.map(([label, value]) => (
          <div key={label}>
            <dt className="text-xs uppercase tracking-wide text-ink-500">{label}</dt>
            <dd className="font-medium tabular-nums">{value}</dd>
          </div>
        ))}
      </dl>
      {battery.warnings.map((w) => (
        <WarningNote key={w.message} message={w.message} />
      ))}
    </div>
  );
}
