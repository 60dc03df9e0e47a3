import { FormField, describedBy, inputClass } from '@/components/form-field';

export type TerminalKind = 'free' | 'cyclic' | 'steady-value' | 'target';

export const terminalChoices: { value: TerminalKind; label: string }[] = [
  { value: 'steady-value', label: 'Steady value: energy left keeps the steady cycle’s value' },
  { value: 'free', label: 'Free: nothing values energy left at the end' },
  { value: 'cyclic', label: 'Cyclic: end with the SoC you start with' },
  { value: 'target', label: 'Target: end at least at a SoC' },
];

interface Props {
  kind: TerminalKind;
  targetPct: string;
  onChange: (kind: TerminalKind, targetPct: string) => void;
  error?: string | undefined;
}

/** Terminal rule (docs/model.md) with the target SoC beside it when that rule is chosen. */
export function TerminalRuleField({ kind, targetPct, onChange, error }: Props) {
  return (
    <div className="grid gap-2 sm:grid-cols-[2fr_1fr]">
      <FormField id="terminalRule" label="Terminal rule" error={error}>
        <select
          id="terminalRule"
          className={inputClass}
          value={kind}
          aria-invalid={!!error}
          aria-describedby={describedBy('terminalRule', { error })}
          onChange={(e) => onChange(e.target.value as TerminalKind, targetPct)}
        >
          {terminalChoices.map((c) => (
            <option key={c.value} value={c.value}>
              {c.label}
            </option>
          ))}
        </select>
      </FormField>
      {kind === 'target' && (
        <FormField id="targetPct" label="End SoC at least" unit="%" error={error}>
          <input
            id="targetPct"
            inputMode="decimal"
            className={inputClass}
            value={targetPct}
            aria-invalid={!!error}
            aria-describedby={describedBy('targetPct', { error })}
            onChange={(e) => onChange(kind, e.target.value)}
          />
        </FormField>
      )}
    </div>
  );
}
