import { useState, type FormEvent } from 'react';
import {
  BATTERY_FIELD_LABELS,
  batterySchema,
  type Battery,
  type BatteryFields,
  type BatteryParams,
} from '@shared/schemas/battery';
import { lithiumIonDefaults } from '@shared/schemas/battery-defaults';
import { batteryWarnings, type SiteLimits } from '@shared/schemas/battery-warnings';
import { FormActions, FormField, WarningNote, buttonClass, describedBy, inputClass } from '@/components/form-field';
import { NumberFormatChoice } from '@/components/number-format-choice';
import { fieldErrors, numberInputErrors, numberText, parseNumberInput } from '@/lib/form-values';
import { formatEfficiency, formatFixed, formatNumber } from '@/lib/format';
import { BATTERY_FIELD_GROUPS } from './battery-form-fields';

type ParamKey = keyof BatteryParams;
type Text = Record<ParamKey | 'name', string>;

function toText(values: Omit<BatteryFields, 'name'> & { name?: string }): Text {
  const text = { name: values.name ?? '' } as Text;
  for (const key of Object.keys(BATTERY_FIELD_LABELS) as ParamKey[]) text[key] = numberText(values[key]);
  return text;
}

function fromText(text: Text) {
  const values: Record<string, unknown> = { name: text.name };
  for (const key of Object.keys(BATTERY_FIELD_LABELS) as ParamKey[]) {
    const n = parseNumberInput(text[key]);
    // Only the cycle limit may be empty (= none); elsewhere an empty field is an error zod names.
    values[key] = n === null && key !== 'maxCyclesPerDay' ? undefined : n;
  }
  return values;
}

export interface BatteryFormProps {
  battery?: Battery;
  site: SiteLimits & { currency: string };
  serverError?: unknown;
  pending: boolean;
  onSubmit: (fields: BatteryFields) => void;
  onCancel?: () => void;
}

/** Every battery parameter with its unit; errors (brick) and common-practice warnings (amber) beside each field. */
export function BatteryForm({ battery, site, serverError, pending, onSubmit, onCancel }: BatteryFormProps) {
  const [text, setText] = useState<Text>(() => toText(battery ?? lithiumIonDefaults()));
  const [touched, setTouched] = useState(false);
  const parsed = batterySchema.safeParse(fromText(text));
  const numberTexts = Object.fromEntries((Object.keys(BATTERY_FIELD_LABELS) as ParamKey[]).map((key) => [key, text[key]]));
  const errors = {
    ...(touched && !parsed.success ? fieldErrors(parsed.error) : {}),
    // Why a number was refused (a separator of the other format, "3.000"), over the schema's "enter a number".
    ...(touched ? numberInputErrors(numberTexts) : {}),
    ...(serverError ? fieldErrors(serverError) : {}),
  };
  const warnings = parsed.success ? batteryWarnings(parsed.data, site) : [];
  const warningFor = (key: ParamKey) =>
    warnings
      .filter((w) => w.field === key)
      .map((w) => w.message)
      .join(' ') || undefined;
  const general = warnings.filter((w) => w.field === null);
  const set = (key: keyof Text, value: string) => setText((t) => ({ ...t, [key]: value }));

  const fillDefaults = () => {
    const energy = parseNumberInput(text.energyKwh);
    setText((t) => ({ ...toText(lithiumIonDefaults(energy !== null && energy > 0 ? energy : undefined)), name: t.name }));
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    setTouched(true);
    if (parsed.success) onSubmit(parsed.data);
  };

  return (
    <form onSubmit={submit} noValidate className="space-y-5" aria-label={battery ? 'Edit battery' : 'New battery'}>
      <NumberFormatChoice id="battery-number-format" />
      <div className="max-w-md">
        <FormField id="battery-name" label="Name" error={errors.name}>
          <input
            id="battery-name"
            className={inputClass}
            value={text.name}
            onChange={(e) => set('name', e.target.value)}
            aria-invalid={Boolean(errors.name)}
            aria-describedby={describedBy('battery-name', { error: errors.name })}
          />
        </FormField>
      </div>
      {BATTERY_FIELD_GROUPS.map((group) => (
        <fieldset key={group.legend} className="rounded border border-ink-100 bg-white p-4">
          <legend className="px-1 text-sm font-semibold text-ink-700">{group.legend}</legend>
          <div className="grid gap-4 sm:grid-cols-3">
            {group.fields.map(({ key, hint }) => {
              const id = `battery-${key}`;
              const { label, unit } = BATTERY_FIELD_LABELS[key];
              const shownUnit = unit.replace('currency', site.currency);
              const warning = warningFor(key);
              return (
                <FormField key={key} id={id} label={label} unit={shownUnit} error={errors[key]} warning={warning} hint={hint}>
                  <input
                    id={id}
                    className={inputClass}
                    inputMode="decimal"
                    value={text[key]}
                    onChange={(e) => set(key, e.target.value)}
                    aria-invalid={Boolean(errors[key])}
                    aria-describedby={describedBy(id, { error: errors[key], warning, hint })}
                  />
                </FormField>
              );
            })}
          </div>
        </fieldset>
      ))}
      {parsed.success && (
        <p className="text-sm text-ink-700">
          Round-trip efficiency {formatEfficiency(parsed.data.efficiencyCharge * parsed.data.efficiencyDischarge)} · duration{' '}
          {formatFixed(parsed.data.energyKwh / parsed.data.powerDischargeKw, 2)} h · usable{' '}
          {formatNumber((parsed.data.energyKwh * (parsed.data.socMaxPct - parsed.data.socMinPct)) / 100, 1)} kWh
        </p>
      )}
      {general.map((w) => (
        <WarningNote key={w.message} message={w.message} />
      ))}
      <FormActions
        pending={pending}
        submitLabel={battery ? 'Save battery' : 'Add battery'}
        formError={errors['']}
        onCancel={onCancel}
      >
        <button type="button" className={buttonClass.secondary} onClick={fillDefaults}>
          Use lithium-ion defaults for this energy
        </button>
      </FormActions>
    </form>
  );
}
