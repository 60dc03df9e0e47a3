import { BATTERY_FIELD_LABELS, type Battery, type BatteryParams } from '@shared/schemas/battery';
import { WarningNote } from '@/components/form-field';

/** Every parameter with its unit, and the warnings in amber: the read-only view of a battery. */
export function BatteryDetails({ battery, currency }: { battery: Battery; currency: string }) {
  const keys = Object.keys(BATTERY_FIELD_LABELS) as (keyof BatteryParams)[];
  return (
    <div className="space-y-3">
      <dl className="grid grid-cols-1 gap-x-6 gap-y-2 rounded bg-white p-4 shadow-sm sm:grid-cols-3">
        {keys.map((key) => {
          const { label, unit } = BATTERY_FIELD_LABELS[key];
          const value = battery[key];
          return (
            <div key={key}>
              <dt className="text-xs uppercase tracking-wide text-ink-500">{label}</dt>
              <dd className="font-medium tabular-nums">
                {value === null
                  ? 'none'
                  : `${value.toLocaleString(undefined, { maximumFractionDigits: 4 })} ${unit.replace('currency', currency)}`}
              </dd>
            </div>
          );
        })}
      </dl>
      {battery.warnings.map((w) => (
        <WarningNote key={w.message} message={w.message} />
      ))}
    </div>
  );
}
