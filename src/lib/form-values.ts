/**
 * Helpers for forms validated with the shared zod schemas: text inputs to
 * numbers, and zod or server (422) issues to one message per field.
 */
import type { ZodError } from 'zod';
import { ApiError } from './api-client';

/** '' → null (field left empty); otherwise a number, NaN when it is not one (zod then names the field). A decimal comma is read as a point. */
export function parseNumberInput(text: string): number | null {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  return /^[+-]?(\d+([.,]\d*)?|[.,]\d+)(e[+-]?\d+)?$/i.test(trimmed) ? Number(trimmed.replace(',', '.')) : Number.NaN;
}

export const numberText = (value: number | null | undefined) => (value === null || value === undefined ? '' : String(value));

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
