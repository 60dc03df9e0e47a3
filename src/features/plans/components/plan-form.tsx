/**
 * The plan form: battery, profiles, delivery window (in the site's local time),
 * horizon, terminal rule and initial SoC (proposed: the last approved plan's end
 * SoC, else the battery's). Sends POST /api/plans and opens the plan page.
 */
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { planCreateSchema } from '@shared/schemas/plan';
import type { SteadyDays } from '@shared/schemas/steady-days';
import { FormField, buttonClass, describedBy, inputClass } from '@/components/form-field';
import { RunSourceFields, useRunSourceLists, type RunSource } from '@/components/run-source-fields';
import { SteadyDaysField, steadyDaysOf } from '@/components/steady-days-field';
import { NumberFormatChoice } from '@/components/number-format-choice';
import { fieldErrors, numberInputErrors, numberText, parseNumberInput, readNumberInput } from '@/lib/form-values';
import { formatNumber, fromWallTimeInput, toWallTimeInput } from '@/lib/format';
import { useCreatePlan } from '../api/create-plan';
import { usePlanDefaults } from '../api/get-plan-defaults';
import { TerminalRuleField, type TerminalKind } from './terminal-rule-field';
import { prefilledTerminal, prefilledWindow, runSourceOf, type PlanPrefill } from './new-plan-prefill';

const DAY_MS = 86_400_000;

/** Tomorrow 00:00 to 24:00 in the site's zone, as wall-time input texts. */
function tomorrow(timeZone: string): { start: string; end: string } {
  const today = toWallTimeInput(Date.now(), timeZone).slice(0, 10);
  const next = (days: number) => new Date(Date.parse(`${today}T00:00:00Z`) + days * DAY_MS).toISOString().slice(0, 10);
  return { start: `${next(1)}T00:00`, end: `${next(2)}T00:00` };
}

const sourceSoc: Record<string, string> = {
  'last-approved-plan': 'the end SoC of the battery’s last approved plan',
  battery: 'the battery’s initial SoC',
  request: 'your entry',
};

/** A number from a link ("25", "40.5") as the form shows it; other text as it is. */
function linkNumber(text: string | undefined): string {
  if (text === undefined || text.trim() === '') return '';
  const n = Number(text);
  return Number.isFinite(n) ? numberText(n) : text;
}

function windowLengthHours(startMs: number | null, endMs: number | null): number | null {
  return startMs === null || endMs === null || endMs <= startMs ? null : (endMs - startMs) / 3_600_000;
}

function horizonHint(siteDefault: number | null, used: number | null): string {
  if (siteDefault === null || used === null) return 'How far ahead the plan looks; at least the delivery window.';
  const base = `Empty: the site's default, ${siteDefault} h.`;
  return used > siteDefault ? `${base} This window is longer, so empty means ${formatNumber(used)} h, the window itself.` : base;
}

export function PlanForm({ initial }: { initial?: PlanPrefill }) {
  const navigate = useNavigate();
  const [source, setSource] = useState<RunSource>(() => runSourceOf(initial));
  const [windowEdit, setWindow] = useState<{ start: string; end: string } | null>(null);
  // Numbers in a link are plain JavaScript text: shown in the person's number format.
  const [horizon, setHorizon] = useState(() => linkNumber(initial?.horizonHours));
  const [terminal, setTerminal] = useState<{ kind: TerminalKind; targetPct: string }>(() => {
    const preset = prefilledTerminal(initial?.terminalRule);
    return { ...preset, targetPct: linkNumber(preset.targetPct) };
  });
  const [soc, setSoc] = useState(() => linkNumber(initial?.initialSocPct));
  const [steadyDays, setSteadyDays] = useState<SteadyDays>(() => steadyDaysOf(initial?.steadyDays));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useCreatePlan();
  const { sites } = useRunSourceLists(source.siteId);
  const site = sites.data?.find((s) => s.id === source.siteId);
  const timeZone = site?.timezone ?? 'UTC';
  // A preset window (instants in the link) reads as wall times once the site's zone is known, until edited.
  const deliveryWindow = windowEdit ?? prefilledWindow(initial, timeZone);
  const startMs = fromWallTimeInput(deliveryWindow.start, timeZone);
  const defaults = usePlanDefaults(source.batteryId || null, startMs === null ? null : new Date(startMs).toISOString());
  const siteDefault = defaults.data?.defaultHorizonHours ?? site?.defaultHorizonHours ?? null;
  // An empty horizon takes the site's default, stretched to cover the window when the window is longer
  // (a study may recommend a horizon shorter than a day).
  const windowHours = windowLengthHours(startMs, fromWallTimeInput(deliveryWindow.end, timeZone));
  const defaultHorizon = siteDefault === null ? null : Math.max(siteDefault, windowHours ?? 0);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const endMs = fromWallTimeInput(deliveryWindow.end, timeZone);
    const horizonValue = horizon.trim() === '' ? defaultHorizon : parseNumberInput(horizon);
    const target = readNumberInput(terminal.targetPct);
    const body = {
      batteryId: source.batteryId,
      priceProfileId: source.priceProfileId,
      loadProfileId: source.loadProfileId || null,
      generationProfileId: source.generationProfileId || null,
      deliveryStart: startMs === null ? '' : new Date(startMs).toISOString(),
      deliveryEnd: endMs === null ? '' : new Date(endMs).toISOString(),
      horizonHours: horizonValue,
      terminalRule: terminal.kind === 'target' ? `target:${target.value ?? ''}` : terminal.kind,
      initialSocPct: parseNumberInput(soc),
      steadyDays,
    };
    const parsed = planCreateSchema.safeParse(body);
    // Why a typed number was refused (the other format's separator, "3.000") says more than "give a number".
    const refused = numberInputErrors({ horizonHours: horizon, initialSocPct: soc });
    if (terminal.kind === 'target' && target.error) refused.terminalRule = target.error;
    if (!parsed.success || Object.keys(refused).length > 0) {
      setErrors({ ...(parsed.success ? {} : fieldErrors(parsed.error)), ...refused });
      return;
    }
    setErrors({});
    create.mutate(body as Parameters<typeof create.mutate>[0], {
      onSuccess: (created) => void navigate(`/plans/${created.plan.id}`),
      onError: (error) => setErrors(fieldErrors(error)),
    });
  };

  return (
    <form onSubmit={submit} noValidate className="space-y-5 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <NumberFormatChoice id="plan-number-format" />
      <RunSourceFields value={source} onChange={setSource} errors={errors} />
      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-sm font-semibold text-ink-800">Delivery window ({timeZone} local time)</legend>
        <FormField id="deliveryStart" label="From" error={errors.deliveryStart}>
          <input
            id="deliveryStart"
            type="datetime-local"
            className={inputClass}
            value={deliveryWindow.start}
            aria-invalid={!!errors.deliveryStart}
            aria-describedby={describedBy('deliveryStart', { error: errors.deliveryStart })}
            onChange={(e) => setWindow({ ...deliveryWindow, start: e.target.value })}
          />
        </FormField>
        <FormField id="deliveryEnd" label="To" error={errors.deliveryEnd}>
          <input
            id="deliveryEnd"
            type="datetime-local"
            className={inputClass}
            value={deliveryWindow.end}
            aria-invalid={!!errors.deliveryEnd}
            aria-describedby={describedBy('deliveryEnd', { error: errors.deliveryEnd })}
            onChange={(e) => setWindow({ ...deliveryWindow, end: e.target.value })}
          />
        </FormField>
        <div className="flex items-end">
          <button type="button" className={buttonClass.secondary} onClick={() => setWindow(tomorrow(timeZone))}>
            Tomorrow
          </button>
        </div>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-3">
        <FormField
          id="horizonHours"
          label="Horizon"
          unit="h"
          error={errors.horizonHours}
          hint={horizonHint(siteDefault, defaultHorizon)}
        >
          <input
            id="horizonHours"
            inputMode="decimal"
            className={inputClass}
            value={horizon}
            placeholder={defaultHorizon !== null ? numberText(defaultHorizon) : '48'}
            aria-invalid={!!errors.horizonHours}
            aria-describedby={describedBy('horizonHours', { error: errors.horizonHours })}
            onChange={(e) => setHorizon(e.target.value)}
          />
        </FormField>
        <FormField
          id="initialSocPct"
          label="Initial SoC"
          unit="%"
          error={errors.initialSocPct}
          hint={
            defaults.data
              ? `Empty: ${formatNumber(defaults.data.initialSocPct)} %, ${sourceSoc[defaults.data.initialSocSource]}.`
              : undefined
          }
        >
          <input
            id="initialSocPct"
            inputMode="decimal"
            className={inputClass}
            value={soc}
            placeholder={defaults.data ? numberText(defaults.data.initialSocPct) : ''}
            aria-invalid={!!errors.initialSocPct}
            aria-describedby={describedBy('initialSocPct', { error: errors.initialSocPct })}
            onChange={(e) => setSoc(e.target.value)}
          />
        </FormField>
        <SteadyDaysField value={steadyDays} onChange={setSteadyDays} error={errors.steadyDays} />
      </div>
      <TerminalRuleField
        kind={terminal.kind}
        targetPct={terminal.targetPct}
        error={errors.terminalRule}
        onChange={(kind, targetPct) => setTerminal({ kind, targetPct })}
      />
      {errors[''] && (
        <p role="alert" className="text-sm text-brick-700">
          {errors['']}
        </p>
      )}
      <button type="submit" className={buttonClass.primary} disabled={create.isPending}>
        {create.isPending ? 'Queuing…' : 'Make the plan'}
      </button>
    </form>
  );
}
