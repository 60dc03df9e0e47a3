import { useState, type FormEvent } from 'react';
import { siteCreateSchema, type Site, type SiteFields } from '@shared/schemas/site';
import { FormActions, FormField, describedBy, inputClass } from '@/components/form-field';
import { NumberFormatChoice } from '@/components/number-format-choice';
import { fieldErrors, numberInputErrors, numberText, parseNumberInput } from '@/lib/form-values';
import { TimeZoneSelect } from './time-zone-select';

type Text = Record<
  'name' | 'timezone' | 'importLimitKw' | 'exportLimitKw' | 'demandChargePerKw' | 'currency' | 'defaultHorizonHours',
  string
>;

const ZONE_HINT = 'Local times in uploaded profiles are read in this zone.';
const CURRENCY_HINT = 'ISO 4217 code, e.g. EUR, USD, GBP.';

const browserZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone;

function toText(site?: Site): Text {
  return {
    name: site?.name ?? '',
    timezone: site?.timezone ?? browserZone(),
    importLimitKw: numberText(site?.importLimitKw),
    exportLimitKw: numberText(site?.exportLimitKw),
    demandChargePerKw: numberText(site?.demandChargePerKw),
    currency: site?.currency ?? 'EUR',
    defaultHorizonHours: numberText(site?.defaultHorizonHours),
  };
}

function fromText(t: Text) {
  return {
    name: t.name,
    timezone: t.timezone,
    importLimitKw: parseNumberInput(t.importLimitKw),
    exportLimitKw: parseNumberInput(t.exportLimitKw),
    demandChargePerKw: parseNumberInput(t.demandChargePerKw),
    currency: t.currency,
    defaultHorizonHours: parseNumberInput(t.defaultHorizonHours),
  };
}

export interface SiteFormProps {
  site?: Site;
  /** Server answer to the last submit (422 issues land beside their fields). */
  serverError?: unknown;
  pending: boolean;
  onSubmit: (fields: SiteFields) => void;
  onCancel?: () => void;
}

/** Create or edit a site; validated with the shared schema before it is sent. */
export function SiteForm({ site, serverError, pending, onSubmit, onCancel }: SiteFormProps) {
  const [text, setText] = useState<Text>(() => toText(site));
  const [touched, setTouched] = useState(false);
  const parsed = siteCreateSchema.safeParse(fromText(text));
  const { importLimitKw, exportLimitKw, demandChargePerKw, defaultHorizonHours } = text;
  const errors = {
    ...(touched && !parsed.success ? fieldErrors(parsed.error) : {}),
    // Why a number was refused (a separator of the other format, "3.000"), over the schema's "enter a number".
    ...(touched ? numberInputErrors({ importLimitKw, exportLimitKw, demandChargePerKw, defaultHorizonHours }) : {}),
    ...(serverError ? fieldErrors(serverError) : {}),
  };
  const set = (key: keyof Text) => (value: string) => setText((t) => ({ ...t, [key]: value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setTouched(true);
    if (parsed.success) onSubmit(parsed.data);
  };

  const numberField = (
    key: 'importLimitKw' | 'exportLimitKw' | 'demandChargePerKw' | 'defaultHorizonHours',
    label: string,
    unit: string,
    hint: string,
  ) => {
    const id = `site-${key}`;
    return (
      <FormField id={id} label={label} unit={unit} error={errors[key]} hint={hint}>
        <input
          id={id}
          className={inputClass}
          inputMode="decimal"
          value={text[key]}
          onChange={(e) => set(key)(e.target.value)}
          aria-invalid={Boolean(errors[key])}
          aria-describedby={describedBy(id, { error: errors[key], hint })}
        />
      </FormField>
    );
  };

  return (
    <form
      onSubmit={submit}
      noValidate
      className="grid max-w-3xl gap-4 sm:grid-cols-2"
      aria-label={site ? 'Edit site' : 'New site'}
    >
      <div className="sm:col-span-2">
        <NumberFormatChoice id="site-number-format" />
      </div>
      <FormField id="site-name" label="Name" error={errors.name}>
        <input
          id="site-name"
          className={inputClass}
          value={text.name}
          onChange={(e) => set('name')(e.target.value)}
          aria-invalid={Boolean(errors.name)}
          aria-describedby={describedBy('site-name', { error: errors.name })}
        />
      </FormField>
      <FormField id="site-timezone" label="Time zone" error={errors.timezone} hint={ZONE_HINT}>
        <TimeZoneSelect
          id="site-timezone"
          value={text.timezone}
          onChange={set('timezone')}
          describedBy={describedBy('site-timezone', { error: errors.timezone, hint: ZONE_HINT })}
        />
      </FormField>
      {numberField('importLimitKw', 'Import limit', 'kW', 'Largest grid import; empty = no limit.')}
      {numberField('exportLimitKw', 'Export limit', 'kW', 'Largest grid export; empty = no limit.')}
      {numberField(
        'demandChargePerKw',
        'Demand charge',
        `${text.currency || 'currency'}/kW`,
        'Per kW of peak import; empty = none.',
      )}
      <FormField id="site-currency" label="Currency" error={errors.currency} hint={CURRENCY_HINT}>
        <input
          id="site-currency"
          className={`${inputClass} uppercase`}
          maxLength={3}
          value={text.currency}
          onChange={(e) => set('currency')(e.target.value)}
          aria-invalid={Boolean(errors.currency)}
          aria-describedby={describedBy('site-currency', { error: errors.currency, hint: CURRENCY_HINT })}
        />
      </FormField>
      {numberField('defaultHorizonHours', 'Default horizon', 'hours', 'Proposed for new plans; empty = choose each time.')}
      <FormActions
        pending={pending}
        submitLabel={site ? 'Save site' : 'Create site'}
        formError={errors['']}
        onCancel={onCancel}
      />
    </form>
  );
}
