/**
 * The signed-in person's number format: which of point and comma is the decimal
 * separator, for every number typed into a form and every number shown. It is
 * chosen explicitly (the account menu, and beside the forms that take numbers)
 * and kept in this browser; until then it follows the browser's language, and
 * the forms say which format they read.
 */
import { useSyncExternalStore } from 'react';
import type { DecimalSeparator } from '@shared/numbers';

const STORAGE_KEY = 'slackwater.decimalSeparator';
const listeners = new Set<() => void>();

function browserDefault(): DecimalSeparator {
  const language = typeof navigator === 'undefined' ? 'en-US' : navigator.language;
  const decimal = new Intl.NumberFormat(language).formatToParts(1.5).find((p) => p.type === 'decimal')?.value;
  return decimal === ',' ? ',' : '.';
}

function stored(): DecimalSeparator | null {
  try {
    const value = globalThis.localStorage?.getItem(STORAGE_KEY);
    return value === '.' || value === ',' ? value : null;
  } catch {
    return null; // storage refused (private mode): the default holds
  }
}

let current: DecimalSeparator = stored() ?? browserDefault();

export function getDecimalSeparator(): DecimalSeparator {
  return current;
}

export function setDecimalSeparator(next: DecimalSeparator): void {
  current = next;
  try {
    globalThis.localStorage?.setItem(STORAGE_KEY, next);
  } catch {
    // kept for this page only
  }
  for (const listener of listeners) listener();
}

const subscribe = (listener: () => void) => {
  listeners.add(listener);
  return () => listeners.delete(listener);
};

/** The decimal separator in use; components re-render when it is changed. */
export function useDecimalSeparator(): DecimalSeparator {
  return useSyncExternalStore(subscribe, getDecimalSeparator, getDecimalSeparator);
}

/** The locale whose digits grouping and decimal sign match the format (for toLocaleString). */
export function displayLocale(decimal: DecimalSeparator = current): string {
  return decimal === ',' ? 'de-DE' : 'en-US';
}
