/**
 * The one rule for reading numbers (form fields and uploads with a declared
 * separator): the decimal separator is chosen, the other one only groups digits
 * in threes, and what fits neither, or reads two ways, is refused with a message.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseDecimal, type DecimalSeparator } from '@shared/numbers';

const value = (text: string, decimal: DecimalSeparator, strict = true) => {
  const reading = parseDecimal(text, decimal, { strict });
  if (!reading.ok) throw new Error(`expected "${text}" to be read, got: ${reading.reason}`);
  return reading.value;
};
const reason = (text: string, decimal: DecimalSeparator, strict = true) => {
  const reading = parseDecimal(text, decimal, { strict });
  if (reading.ok) throw new Error(`expected "${text}" to be refused, got ${reading.value}`);
  return reading.reason;
};

describe('reading numbers in the chosen format', () => {
  // [S] 22nd CGPM (2003), Resolution 10: the decimal marker is either the point on the line or the comma on the line.
  it('reads the decimal separator of the format chosen, and only that one', () => {
    expect(value('0.99', '.')).toBe(0.99);
    expect(value('0,99', ',')).toBe(0.99);
    expect(reason('0,99', '.')).toMatch(/"0,99" is written with a decimal comma.*If you meant 0\.99, write 0\.99.*1\.234,5/);
    expect(reason('1.5', ',')).toMatch(/"1\.5" is written with a decimal point.*If you meant 1,5, write 1,5/);
  });

  it('reads the other separator as a thousands separator in groups of three digits', () => {
    // [D] 1.010,25 = 1010 + 0.25, the example of the upload option.
    expect(value('1.010,25', ',')).toBe(1010.25);
    expect(value('1,010.25', '.')).toBe(1010.25);
    expect(value('1,234,567.891', '.')).toBe(1_234_567.891);
    expect(value('3.000', ',')).toBe(3000);
    expect(value('3,000', '.')).toBe(3000);
    // [S] SI Brochure, 9th edition (2019), section 5.4.4: digits may be grouped in threes separated by a thin space.
    expect(value('1 234,5', ',')).toBe(1234.5);
    expect(value('1\u202f234.5', '.')).toBe(1234.5);
  });

  it('refuses separators that fit neither reading instead of guessing', () => {
    expect(reason('12,34,567', '.')).toMatch(/comma that does not separate groups of three digits/);
    expect(reason('1.2.3', '.')).toMatch(/more than one decimal point/);
    expect(reason('1.234,5', '.')).toMatch(/If you meant 1234\.5, write 1234\.5/);
    // A grouped number never starts with 0: "0.922" is not 922 with a decimal comma.
    expect(reason('0.922', ',')).toMatch(/If you meant 0,922, write 0,922/);
    expect(reason('12 EUR', '.')).toMatch(/"12 EUR" is not a number/);
  });

  it('refuses a typed number that reads as two values 1000 apart, in either format', () => {
    // [D] "3.000" is 3 with a decimal point and 3000 with a thousands point; "3,000" the same the other way.
    expect(reason('3.000', '.')).toMatch(/"3\.000" is ambiguous: in 1,234\.5 it is 3, .*Write 3 or 3000/);
    expect(reason('3,000', ',')).toMatch(/"3,000" is ambiguous: in 1\.234,5 it is 3, .*Write 3 or 3000/);
    expect(reason('12.500', '.')).toMatch(/Write 12\.5 or 12500/);
    // Not ambiguous: a leading zero, four leading digits, two separators, other decimal counts.
    expect(value('0.922', '.')).toBe(0.922);
    expect(value('1234.500', '.')).toBe(1234.5);
    expect(value('3.000,5', ',')).toBe(3000.5);
    expect(value('3.00', '.')).toBe(3);
    // A file's declared separator settles it: uploads read "3.000" as the file says.
    expect(value('3.000', '.', false)).toBe(3);
  });

  it('reads signs, exponents and the typographic minus, and refuses what is no finite number', () => {
    expect(value('-12.5', '.')).toBe(-12.5);
    expect(value('\u22124,5', ',')).toBe(-4.5);
    expect(value('+2e3', '.')).toBe(2000);
    expect(value(',5', ',')).toBe(0.5);
    expect(value('-0', '.')).toBe(0);
    expect(Object.is(value('-0', '.'), -0)).toBe(false);
    expect(reason('NaN', '.')).toMatch(/not a finite number/);
    expect(reason('1e309', '.')).toMatch(/too large/);
    expect(parseDecimal('  ', '.')).toEqual({ ok: false, blank: true, reason: 'the value is empty' });
  });

  it('reads back every number the runtime formats in English or German (Unicode CLDR data through Intl)', () => {
    // [S] Unicode CLDR number symbols, as the JavaScript runtime's Intl.NumberFormat applies them:
    // en-US writes 1,010.25 and de-DE writes 1.010,25.
    expect(new Intl.NumberFormat('de-DE').format(1010.25)).toBe('1.010,25');
    fc.assert(
      fc.property(fc.integer({ min: -9_999_999_999, max: 9_999_999_999 }), fc.integer({ min: 0, max: 3 }), (n, digits) => {
        const x = n / 10 ** digits;
        for (const [locale, decimal] of [
          ['en-US', '.'],
          ['de-DE', ','],
        ] as const) {
          const text = new Intl.NumberFormat(locale, { maximumFractionDigits: 3 }).format(x);
          expect(value(text, decimal, false)).toBe(x === 0 ? 0 : x);
        }
      }),
    );
  });
});
