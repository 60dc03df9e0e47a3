/**
 * One rule for reading a typed or uploaded number in a chosen format: the
 * decimal separator is stated (a point, or a comma), the other of the two then
 * only separates groups of three digits (as in 1.010,25 or 1,010.25), and
 * anything that fits neither is refused with what to write instead. Nothing is
 * guessed: "0,99" is 0.99 only where the comma is the decimal separator.
 *
 * Typed numbers (`strict`) also refuse the one shape that reads validly in both
 * formats with two values 1000 apart: a single decimal separator followed by
 * exactly three digits after 1-3 leading digits ("3.000" with a decimal point
 * is 3, but it is how 3000 is written with a thousands point). A file's declared
 * separator settles that for the whole file, so uploads read it as declared.
 */

export type DecimalSeparator = '.' | ',';

export type DecimalReading =
  { readonly ok: true; readonly value: number } | { readonly ok: false; readonly blank: boolean; readonly reason: string };

export interface DecimalOptions {
  /** Refuse "3.000"-like text (typed entry); default false (files with a declared separator). */
  readonly strict?: boolean;
}

const NON_FINITE_WORDS = /^[+-]?(?:nan|inf|infinity|∞)$/i;
// Space, no-break space and narrow no-break space, as spreadsheets group digits in some languages.
const SPACES = /[ \u00a0\u202f]/;

const escape = (c: string) => (c === '.' ? '\\.' : c);
const name = (c: string) => (c === '.' ? 'point' : 'comma');

/** "1,234.5" or "1.234,5": the format as people recognise it. */
export function numberFormatExample(decimal: DecimalSeparator): string {
  return decimal === '.' ? '1,234.5' : '1.234,5';
}

function pattern(decimal: DecimalSeparator, group: string): RegExp {
  const g = escape(group);
  const d = escape(decimal);
  // An integer part either plain, or grouped in threes by one kind of separator; then decimals; then an exponent.
  // A grouped integer never starts with 0, so "0.922" cannot be read as 922.
  return new RegExp(
    `^([+-]?)(\\d+|[1-9]\\d{0,2}(?:${g}\\d{3})+|[1-9]\\d{0,2}(?:[ \\u00a0\\u202f]\\d{3})+)?(?:${d}(\\d*))?([eE][+-]?\\d+)?$`,
  );
}

const fail = (reason: string): DecimalReading => ({ ok: false, blank: false, reason });

/** Plain text of a value in the given format, e.g. 1234.5 as "1234,5": what to write instead. */
export function plainNumberText(value: number, decimal: DecimalSeparator): string {
  const text = String(value);
  return decimal === '.' || /e/i.test(text) ? text : text.replace('.', ',');
}

function explain(text: string, decimal: DecimalSeparator, group: DecimalSeparator): string {
  const format = `the number format ${numberFormatExample(decimal)}`;
  const other = readPlain(text, group);
  const meant = other === null ? null : plainNumberText(Number(other), decimal);
  if (text.includes(group) && meant !== null) {
    return `"${text}" is written with a decimal ${name(group)}; in ${format} a ${name(group)} only separates groups of three digits. If you meant ${meant}, write ${meant}, or change the number format to ${numberFormatExample(group)}`;
  }
  if (text.split(decimal).length > 2) return `"${text}" has more than one decimal ${name(decimal)}`;
  if (text.includes(group)) {
    return `"${text}" has a ${name(group)} that does not separate groups of three digits (in ${format} decimals follow a ${name(decimal)})`;
  }
  if (SPACES.test(text) && /^[+-]?[\d.,\s\u00a0\u202f]+$/.test(text))
    return `"${text}" has spaces that do not separate groups of three digits`;
  return `"${text}" is not a number`;
}

interface Parts {
  readonly sign: string;
  /** Digits before the decimal separator, group separators still in; undefined when none ("‚5"). */
  readonly integer: string | undefined;
  readonly fraction: string | undefined;
  readonly exponent: string;
}

function split(text: string, decimal: DecimalSeparator): Parts | null {
  const group: DecimalSeparator = decimal === '.' ? ',' : '.';
  const m = pattern(decimal, group).exec(text);
  if (m === null) return null;
  const parts = { sign: m[1] ?? '', integer: m[2], fraction: m[3], exponent: m[4] ?? '' };
  return parts.integer === undefined && (parts.fraction === undefined || parts.fraction === '') ? null : parts;
}

const plainOf = (p: Parts) =>
  `${p.sign}${(p.integer ?? '0').replace(/[^\d]/g, '')}${p.fraction ? `.${p.fraction}` : ''}${p.exponent}`;

/** The text in JavaScript's own number syntax when it fits the format, else null. */
function readPlain(text: string, decimal: DecimalSeparator): string | null {
  const parts = split(text, decimal);
  return parts === null ? null : plainOf(parts);
}

/** Reads `input` with `decimal` as its decimal separator (see the file comment for the rule). */
export function parseDecimal(input: string, decimal: DecimalSeparator, options: DecimalOptions = {}): DecimalReading {
  // The typographic minus (U+2212) is what many documents and spreadsheets write.
  const text = input.trim().replace(/^\u2212/, '-');
  if (text === '') return { ok: false, blank: true, reason: 'the value is empty' };
  if (NON_FINITE_WORDS.test(text)) return fail(`"${text}" is not a finite number`);
  const parts = split(text, decimal);
  if (parts === null) return fail(explain(text, decimal, decimal === '.' ? ',' : '.'));
  const { integer, fraction } = parts;
  if (options.strict && integer !== undefined && /^[1-9]\d{0,2}$/.test(integer) && fraction?.length === 3 && !parts.exponent) {
    const small = plainNumberText(Number(`${integer}.${fraction}`), decimal);
    const large = `${integer}${fraction}`;
    return fail(
      `"${text}" is ambiguous: in ${numberFormatExample(decimal)} it is ${small}, but it is also how ${large} is written with a thousands ${name(decimal)}. Write ${small} or ${large}`,
    );
  }
  const value = Number(plainOf(parts));
  // e.g. 1e309 overflows to Infinity in IEEE 754 double precision.
  if (!Number.isFinite(value)) return fail(`"${text}" is too large to be a finite number`);
  // -0 would survive into JSON as 0 anyway; normalise so round trips compare equal.
  return { ok: true, value: value === 0 ? 0 : value };
}
