/**
 * Helpers for forms validated with the shared zod schemas: text inputs to
 * numbers (in the person's number format, one rule for every field), and zod
 * or server (422) issues to one message per field.
 */
import type { ZodError } from 'zod';
import { parseDecimal, plainNumberText } from '@shared/numbers';
import { ApiError } from './api-client';
import { getDecimalSeparator } from './number-format';

export interface NumberInput {
  /** null: the field was left empty; NaN: refused (see `error`). */
  value: number | null;
  /** Why the text was refused, to show beside the field. */
  error?: string;
}

/** Reads a typed number in the chosen format; ambiguous or foreign separators are refused, never guessed. */
export function readNumberInput(text: string): NumberInput {
  const reading = parseDecimal(text, getDecimalSeparator(), { strict: true });
  if (reading.ok) return { value: reading.value };
  if (reading.blank) return { value: null };
  return { value: Number.NaN, error: `${reading.reason[0]?.toUpperCase() ?? ''}${reading.reason.slice(1)}.` };
}

/** '' → null (field left empty); otherwise a number, NaN when it is refused (readNumberInput says why). */
export function parseNumberInput(text: string): number | null {
  return readNumberInput(text).value;
}

/** The refusals of number fields, keyed like the fields, to show over the schema's generic message. */
export function numberInputErrors(texts: Record<string, string>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, text] of Object.entries(texts)) {
    const { error } = readNumberInput(text);
    if (error) out[key] = error;
  }
  return out;
}

/** A stored number as the text of an input, in the chosen format (no grouping). */
export const numberText = (value: number | null | undefined) =>
  value === null || value === undefined ? '' : plainNumberText(value, getDecimalSeparator());

/** First message per top-level field; issues without a field go under ''. */
export function fieldErrors(error: unknown): Record<string, string> {
  const out: Record<string, string> = {};
  const issues: { path: string; message: string }[] =
    error instanceof ApiError
      ? error.issues.map((i) => ({ path: i.path ?? '', message: i.message }))
      : error && typeof error === 'object' && 'issues' in error && Array.isArray((error as ZodError).issues)
        ? (error as ZodError).issues.map((i) => ({ path: String(i.path[0] ?? ''), message: i.message }))
        : [];
  for (const issue of issues) {
    const key = issue.path.split('.')[0] ?? '';
    out[key] ??= issue.message;
  }
  if (error instanceof ApiError && issues.length === 0) out[''] = error.message;
  return out;
}
