import type { ReactNode } from 'react';

export interface FormFieldProps {
  /** id of the control inside; the label points at it. */
  id: string;
  label: string;
  /** Unit shown beside the control (kW, %, …). */
  unit?: string | undefined;
  /** Validation error (brick): the value will not be accepted. */
  error?: string | undefined;
  /** Outside common practice (amber): accepted, but check it. */
  warning?: string | undefined;
  hint?: string | undefined;
  children: ReactNode;
}

/** Label, control, unit, and the field's error or warning right beside it (linked with aria-describedby). */
export function FormField({ id, label, unit, error, warning, hint, children }: FormFieldProps) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-ink-800">
        {label}
      </label>
      <div className="flex items-center gap-2">
        {children}
        {unit && <span className="shrink-0 text-sm text-ink-500">{unit}</span>}
      </div>
      {hint && !error && (
        <p id={`${id}-hint`} className="text-xs text-ink-500">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} role="alert" className="text-sm text-brick-700">
          {error}
        </p>
      )}
      {warning && !error && <WarningNote id={`${id}-warning`} message={warning} />}
    </div>
  );
}

/** aria-describedby for a control inside FormField, naming whichever messages are shown. */
export function describedBy(
  id: string,
  f: { error?: string | undefined; warning?: string | undefined; hint?: string | undefined },
) {
  const ids = [f.error && `${id}-error`, f.warning && !f.error && `${id}-warning`, f.hint && !f.error && `${id}-hint`].filter(
    Boolean,
  );
  return ids.length > 0 ? ids.join(' ') : undefined;
}

export const inputClass =
  'w-full rounded border border-ink-300 bg-white px-3 py-1.5 text-ink-900 shadow-sm focus:border-seaglass-600 aria-[invalid=true]:border-brick-600';

/** A select sized to its options, for filters and page sizes beside other controls. */
export const compactSelect = 'rounded border border-ink-300 bg-white px-2 py-1 text-ink-900 focus:border-seaglass-600';

export const buttonClass = {
  primary:
    'rounded bg-seaglass-700 px-4 py-2 text-sm font-semibold text-white hover:bg-seaglass-800 disabled:cursor-not-allowed disabled:opacity-50',
  secondary:
    'rounded border border-ink-300 bg-white px-4 py-2 text-sm font-medium text-ink-800 hover:bg-ink-50 disabled:opacity-50',
  danger:
    'rounded border border-brick-600 bg-white px-3 py-1.5 text-sm font-medium text-brick-700 hover:bg-brick-100 disabled:opacity-50',
};

/** A setting outside common practice: accepted, shown in amber with what to check. */
export function WarningNote({ message, id }: { message: string; id?: string }) {
  return (
    <p id={id} className="rounded bg-amber-100 px-2 py-1 text-sm text-ink-900">
      <span className="font-semibold text-amber-700">Check: </span>
      {message}
    </p>
  );
}

export interface FormActionsProps {
  pending: boolean;
  submitLabel: string;
  /** A message that belongs to no single field (e.g. a server error), shown above the buttons. */
  formError?: string | undefined;
  onCancel?: (() => void) | undefined;
  children?: ReactNode;
}

/** The form's own error, then submit, any extra buttons, and cancel. */
export function FormActions({ pending, submitLabel, formError, onCancel, children }: FormActionsProps) {
  return (
    <div className="space-y-3 sm:col-span-2">
      {formError && (
        <p role="alert" className="text-sm text-brick-700">
          {formError}
        </p>
      )}
      <div className="flex flex-wrap gap-3">
        <button type="submit" className={buttonClass.primary} disabled={pending}>
          {pending ? 'Saving…' : submitLabel}
        </button>
        {children}
        {onCancel && (
          <button type="button" className={buttonClass.secondary} onClick={onCancel}>
            Cancel
          </button>
        )}
      </div>
    </div>
  );
}
