import type { InputHTMLAttributes, ReactNode } from 'react';
import { FormField, describedBy, inputClass } from './form-field';

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id' | 'value' | 'onChange' | 'className'> {
  id: string;
  label: string;
  value: string;
  onValue: (value: string) => void;
  error?: string | undefined;
  hint?: string | undefined;
}

/** A labelled text input with its hint or error beside it (aria-invalid, aria-describedby). */
export function TextField({ id, label, value, onValue, error, hint, ...input }: TextFieldProps) {
  return (
    <FormField id={id} label={label} error={error} hint={hint}>
      <input
        id={id}
        value={value}
        onChange={(e) => onValue(e.target.value)}
        className={inputClass}
        aria-invalid={!!error}
        aria-describedby={describedBy(id, { error, hint })}
        {...input}
      />
    </FormField>
  );
}

const tones = {
  error: 'border-brick-600 bg-brick-100 text-brick-700',
  success: 'border-seaglass-500 bg-seaglass-100 text-ink-900',
};

/** A sentence about the whole form: errors are announced at once (alert), success politely (status). */
export function Notice({ tone, children }: { tone: keyof typeof tones; children: ReactNode }) {
  return (
    <p role={tone === 'error' ? 'alert' : 'status'} className={`rounded border px-3 py-2 text-sm ${tones[tone]}`}>
      {children}
    </p>
  );
}
