/**
 * Reads one value cell. Plain decimal numbers only: an optional sign, digits,
 * one decimal separator, an optional exponent. A decimal comma is read only in
 * semicolon-separated files, where it cannot be confused with the delimiter.
 * Thousands separators are refused rather than guessed.
 */
import { truncate } from './parse-timestamp';

export type NumberReading =
  { readonly ok: true; readonly value: number } | { readonly ok: false; readonly blank: boolean; readonly reason: string };

const DOT_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const COMMA_NUMBER = /^[+-]?(?:\d+(?:,\d*)?|,\d+)(?:[eE][+-]?\d+)?$/;
const NON_FINITE_WORDS = /^[+-]?(?:nan|inf|infinity|∞)$/i;

export function parseNumber(cell: string, decimalComma: boolean): NumberReading {
  if (cell === '') return { ok: false, blank: true, reason: 'the value is empty' };
  let text: string | null = null;
  if (DOT_NUMBER.test(cell)) text = cell;
  else if (decimalComma && COMMA_NUMBER.test(cell)) text = cell.replace(',', '.');

  if (text === null) {
    const shown = truncate(cell);
    if (NON_FINITE_WORDS.test(cell)) {
      return { ok: false, blank: false, reason: `"${shown}" is not a finite number` };
    }
    if (!decimalComma && /^[+-]?\d*,\d+$/.test(cell)) {
      return {
        ok: false,
        blank: false,
        reason: `"${shown}" uses a decimal comma, which is read only in semicolon-separated files`,
      };
    }
    return { ok: false, blank: false, reason: `"${shown}" is not a number` };
  }
  const value = Number(text);
  if (!Number.isFinite(value)) {
    // e.g. 1e309 overflows to Infinity in IEEE 754 double precision.
    return { ok: false, blank: false, reason: `"${truncate(cell)}" is too large to be a finite number` };
  }
  // -0 would survive into JSON as 0 anyway; normalise so round trips compare equal.
  return { ok: true, value: value === 0 ? 0 : value };
}
