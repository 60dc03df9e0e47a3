/**
 * "Steady-cycle days": which local days the steady cycle averages, on the plan and
 * the study forms alike (docs/model.md).
 */
import { steadyDaysLabels, steadyDaysSchema, steadyDaysValues, type SteadyDays } from '@shared/schemas/steady-days';
import { FormField, describedBy, inputClass } from './form-field';

/** The choice of a link or a select; every day when absent or unknown. */
export function steadyDaysOf(text: string | undefined): SteadyDays {
  const parsed = steadyDaysSchema.safeParse(text);
  return parsed.success ? parsed.data : 'all';
}

export function SteadyDaysField({
  value,
  onChange,
  error,
}: {
  value: SteadyDays;
  onChange: (next: SteadyDays) => void;
  error?: string;
}) {
  const hint =
    'The days averaged into the representative day: choose weekdays or weekend days when their prices differ and you plan for that kind of day.';
  return (
    <FormField id="steadyDays" label="Steady-cycle days" error={error} hint={hint}>
      <select
        id="steadyDays"
        className={inputClass}
        value={value}
        aria-invalid={!!error}
        aria-describedby={describedBy('steadyDays', { error, hint })}
        onChange={(e) => onChange(steadyDaysOf(e.target.value))}
      >
        {steadyDaysValues.map((days) => (
          <option key={days} value={days}>
            {steadyDaysLabels[days]}
          </option>
        ))}
      </select>
    </FormField>
  );
}
