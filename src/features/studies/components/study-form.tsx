/**
 * The horizon-study form: battery and profiles, the period (site local time),
 * the horizons to compare, the re-plan interval and the terminal rules.
 */
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { studyCreateSchema } from '@shared/schemas/study';
import type { SteadyDays } from '@shared/schemas/steady-days';
import { FormField, buttonClass, describedBy, inputClass } from '@/components/form-field';
import { RunSourceFields, emptyRunSource, useRunSourceLists, type RunSource } from '@/components/run-source-fields';
import { SteadyDaysField } from '@/components/steady-days-field';
import { NumberFormatChoice } from '@/components/number-format-choice';
import { fieldErrors, numberInputErrors, parseNumberInput } from '@/lib/form-values';
import { useDecimalSeparator } from '@/lib/number-format';
import { fromWallTimeInput } from '@/lib/format';
import { useCreateStudy } from '../api/create-study';

const ruleChoices = ['free', 'steady-value', 'cyclic'];

/** The horizons typed as a list: spaces and semicolons separate them, and commas too where the comma is not the decimal sign. */
function horizonTexts(text: string, decimal: string): string[] {
  return text.split(decimal === ',' ? /[;\s]+/ : /[,;\s]+/).filter(Boolean);
}

export function StudyForm({ initial }: { initial?: Partial<RunSource> }) {
  const navigate = useNavigate();
  const [source, setSource] = useState<RunSource>({ ...emptyRunSource, ...initial });
  const [period, setPeriod] = useState({ start: '', end: '' });
  const decimal = useDecimalSeparator();
  // With a decimal comma, a comma cannot also separate the horizons: semicolons or spaces do.
  const listSeparator = decimal === ',' ? '; ' : ', ';
  const [horizons, setHorizons] = useState([6, 12, 24, 48, 96, 168].join(listSeparator));
  const [replan, setReplan] = useState('1');
  const [rules, setRules] = useState<string[]>(['free', 'steady-value']);
  const [soc, setSoc] = useState('');
  const [steadyDays, setSteadyDays] = useState<SteadyDays>('all');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useCreateStudy();
  const { sites, profiles } = useRunSourceLists(source.siteId);
  const timeZone = sites.data?.find((s) => s.id === source.siteId)?.timezone ?? 'UTC';
  const price = profiles.data?.find((p) => p.id === source.priceProfileId);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    // An empty period means the whole price profile.
    const startMs = period.start ? fromWallTimeInput(period.start, timeZone) : price ? Date.parse(price.start) : null;
    const endMs = period.end ? fromWallTimeInput(period.end, timeZone) : price ? Date.parse(price.end) : null;
    const body = {
      batteryId: source.batteryId,
      priceProfileId: source.priceProfileId,
      loadProfileId: source.loadProfileId || null,
      generationProfileId: source.generationProfileId || null,
      start: startMs === null ? '' : new Date(startMs).toISOString(),
      end: endMs === null ? '' : new Date(endMs).toISOString(),
      horizonsHours: horizonTexts(horizons, decimal).map((h) => parseNumberInput(h)),
      replanHours: parseNumberInput(replan),
      terminalRules: rules,
      initialSocPct: parseNumberInput(soc),
      steadyDays,
    };
    const parsed = studyCreateSchema.safeParse(body);
    const listed = Object.fromEntries(horizonTexts(horizons, decimal).map((h, i) => [`h${i}`, h]));
    const refusedHorizon = Object.values(numberInputErrors(listed))[0];
    const refused = {
      ...numberInputErrors({ replanHours: replan, initialSocPct: soc }),
      ...(refusedHorizon ? { horizonsHours: refusedHorizon } : {}),
    };
    if (!parsed.success || Object.keys(refused).length > 0) {
      setErrors({ ...(parsed.success ? {} : fieldErrors(parsed.error)), ...refused });
      return;
    }
    setErrors({});
    create.mutate(body as Parameters<typeof create.mutate>[0], {
      onSuccess: (created) => void navigate(`/studies/${created.study.id}`),
      onError: (error) => setErrors(fieldErrors(error)),
    });
  };

  const field = (
    id: 'horizonsHours' | 'replanHours' | 'initialSocPct',
    label: string,
    value: string,
    set: (v: string) => void,
    unit: string,
    hint?: string,
  ) => (
    <FormField id={id} label={label} unit={unit} error={errors[id]} hint={hint}>
      <input
        id={id}
        className={inputClass}
        value={value}
        aria-invalid={!!errors[id]}
        aria-describedby={describedBy(id, { error: errors[id], hint })}
        onChange={(e) => set(e.target.value)}
      />
    </FormField>
  );

  return (
    <form onSubmit={submit} noValidate className="space-y-5 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <NumberFormatChoice id="study-number-format" />
      <RunSourceFields value={source} onChange={setSource} errors={errors} />
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-sm font-semibold text-ink-800">
          Period ({timeZone} local time; empty: the whole price profile)
        </legend>
        <FormField id="start" label="From" error={errors.start}>
          <input
            id="start"
            type="datetime-local"
            className={inputClass}
            value={period.start}
            aria-invalid={!!errors.start}
            onChange={(e) => setPeriod({ ...period, start: e.target.value })}
          />
        </FormField>
        <FormField id="end" label="To" error={errors.end}>
          <input
            id="end"
            type="datetime-local"
            className={inputClass}
            value={period.end}
            aria-invalid={!!errors.end}
            onChange={(e) => setPeriod({ ...period, end: e.target.value })}
          />
        </FormField>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-3">
        {field(
          'horizonsHours',
          'Horizons',
          horizons,
          setHorizons,
          'h',
          `Separated by ${decimal === ',' ? 'semicolons' : 'commas'} or spaces; each at least the re-plan interval.`,
        )}
        {field('replanHours', 'Re-plan every', replan, setReplan, 'h')}
        {field('initialSocPct', 'Initial SoC', soc, setSoc, '%', 'Empty: as for a new plan.')}
      </div>
      <div className="grid gap-4 sm:grid-cols-3">
        <SteadyDaysField value={steadyDays} onChange={setSteadyDays} error={errors.steadyDays} />
      </div>
      <fieldset className="text-sm">
        <legend className="mb-1 font-semibold text-ink-800">Terminal rules</legend>
        <div className="flex flex-wrap gap-4">
          {ruleChoices.map((r) => (
            <label key={r} className="flex items-center gap-1">
              <input
                type="checkbox"
                checked={rules.includes(r)}
                onChange={() => setRules(rules.includes(r) ? rules.filter((x) => x !== r) : [...rules, r])}
              />
              {r}
            </label>
          ))}
        </div>
        {errors.terminalRules && (
          <p role="alert" className="text-brick-700">
            {errors.terminalRules}
          </p>
        )}
      </fieldset>
      {errors[''] && (
        <p role="alert" className="text-sm text-brick-700">
          {errors['']}
        </p>
      )}
      <button type="submit" className={buttonClass.primary} disabled={create.isPending}>
        {create.isPending ? 'Queuing…' : 'Run the study'}
      </button>
    </form>
  );
}
