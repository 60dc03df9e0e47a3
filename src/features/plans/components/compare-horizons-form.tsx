/**
 * Adds plans for the same delivery window with other horizons and terminal
 * rules, from the same battery, profiles and initial SoC as a plan already there.
 */
import { useState, type FormEvent } from 'react';
import type { Plan } from '@shared/schemas/plan';
import { buttonClass, inputClass } from '@/components/form-field';
import { ApiError } from '@/lib/api-client';
import { readNumberInput } from '@/lib/form-values';
import { useCreatePlan } from '../api/create-plan';

const horizonChoices = [24, 36, 48, 72, 96, 168];
const ruleChoices = ['free', 'steady-value', 'cyclic'] as const;

export function CompareHorizonsForm({ base, existing }: { base: Plan; existing: Plan[] }) {
  const windowHours = (Date.parse(base.deliveryEnd) - Date.parse(base.deliveryStart)) / 3_600_000;
  const [horizons, setHorizons] = useState<number[]>(horizonChoices.filter((h) => h >= windowHours).slice(0, 3));
  const [rules, setRules] = useState<string[]>(['free', 'steady-value']);
  const [extra, setExtra] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  const create = useCreatePlan();
  const have = new Set(existing.map((p) => `${p.horizonHours}/${p.terminalRule}`));
  const toggle = <T,>(list: T[], value: T) => (list.includes(value) ? list.filter((v) => v !== value) : [...list, value]);

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    const other = readNumberInput(extra);
    if (other.error) {
      setMessage(`Another horizon: ${other.error}`);
      return;
    }
    const all = [...horizons, ...(other.value !== null ? [other.value] : [])].filter(
      (h) => Number.isFinite(h) && h >= windowHours,
    );
    const wanted = all.flatMap((h) => rules.map((r) => ({ h, r }))).filter(({ h, r }) => !have.has(`${h}/${r}`));
    if (wanted.length === 0) {
      setMessage('Every chosen combination already has a plan (horizons shorter than the window are left out).');
      return;
    }
    setMessage(`Queuing ${wanted.length} plan${wanted.length === 1 ? '' : 's'}…`);
    const failures: string[] = [];
    for (const { h, r } of wanted) {
      try {
        await create.mutateAsync({
          batteryId: base.batteryId,
          priceProfileId: base.priceProfileId,
          loadProfileId: base.loadProfileId,
          generationProfileId: base.generationProfileId,
          deliveryStart: base.deliveryStart,
          deliveryEnd: base.deliveryEnd,
          horizonHours: h,
          terminalRule: r,
          initialSocPct: base.initialSocPct,
          // The same steady cycle, or the figures of the compared plans would not be comparable.
          steadyDays: base.inputs?.steadyDays ?? 'all',
        });
      } catch (error) {
        failures.push(`${h} h, ${r}: ${error instanceof ApiError ? (error.issues[0]?.message ?? error.message) : String(error)}`);
      }
    }
    setMessage(
      failures.length
        ? `Some plans were not queued: ${failures.join('; ')}`
        : `${wanted.length} plan${wanted.length === 1 ? '' : 's'} queued.`,
    );
  };

  return (
    <form onSubmit={(e) => void submit(e)} className="space-y-3 rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
      <fieldset className="flex flex-wrap items-center gap-3 text-sm">
        <legend className="mb-1 font-semibold text-ink-800">Horizons (h)</legend>
        {horizonChoices.map((h) => (
          <label key={h} className={`flex items-center gap-1 ${h < windowHours ? 'text-ink-300' : ''}`}>
            <input
              type="checkbox"
              disabled={h < windowHours}
              checked={horizons.includes(h)}
              onChange={() => setHorizons(toggle(horizons, h))}
            />
            {h}
          </label>
        ))}
        <label className="flex items-center gap-1">
          other
          <input
            className={`${inputClass} w-20`}
            inputMode="decimal"
            value={extra}
            onChange={(e) => setExtra(e.target.value)}
            aria-label="Another horizon in hours"
          />
        </label>
      </fieldset>
      <fieldset className="flex flex-wrap items-center gap-3 text-sm">
        <legend className="mb-1 font-semibold text-ink-800">Terminal rules</legend>
        {ruleChoices.map((r) => (
          <label key={r} className="flex items-center gap-1">
            <input type="checkbox" checked={rules.includes(r)} onChange={() => setRules(toggle(rules, r))} />
            {r}
          </label>
        ))}
      </fieldset>
      <button type="submit" className={buttonClass.primary} disabled={create.isPending}>
        Add these plans
      </button>
      {message && (
        <p className="text-sm text-ink-700" role="status">
          {message}
        </p>
      )}
    </form>
  );
}
