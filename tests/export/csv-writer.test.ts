/**
 * The CSV writer follows RFC 4180 and guards text cells against formula
 * injection while numbers stay numbers. Files are read back with papaparse,
 * a parser independent of the writer.
 */
import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { CsvShapeError, writeCsv } from '../../server/export/csv-writer';
import { guardTextCell } from '../../server/export/formula-guard';

const readBack = (text: string): string[][] =>
  Papa.parse<string[]>(text, { delimiter: ',', newline: '\r\n', skipEmptyLines: true }).data;

describe('writes RFC 4180 CSV', () => {
  it('ends every record with CRLF, including the last one', () => {
    // [S: RFC 4180 section 2.1-2.2] records are delimited by CRLF; the last may end with one.
    expect(
      writeCsv(
        ['a', 'b'],
        [
          [1, 2],
          [3, 4],
        ],
      ),
    ).toBe('a,b\r\n1,2\r\n3,4\r\n');
  });

  it('quotes fields holding a comma, a quote, CR or LF and doubles inner quotes', () => {
    // [S: RFC 4180 section 2.6-2.7] such fields are enclosed in double quotes; a quote inside is doubled.
    const text = writeCsv(['note'], [['a,b'], ['say "hi"'], ['two\r\nlines'], ['line\nfeed'], ['plain']]);
    expect(text).toBe('note\r\n"a,b"\r\n"say ""hi"""\r\n"two\r\nlines"\r\n"line\nfeed"\r\nplain\r\n');
    expect(
      readBack(text)
        .slice(1)
        .map((r) => r[0]),
    ).toEqual(['a,b', 'say "hi"', 'two\r\nlines', 'line\nfeed', 'plain']);
  });

  it('refuses a row whose field count differs from the header', () => {
    // [S: RFC 4180 section 2.4] each line should contain the same number of fields.
    expect(() => writeCsv(['a', 'b'], [[1]])).toThrow(CsvShapeError);
  });

  it('writes numbers as plain numbers that read back as the same double, negatives unprefixed', () => {
    // [D] String(x) is the shortest decimal that parses back to x (ECMAScript Number::toString).
    fc.assert(
      fc.property(fc.array(fc.double({ noNaN: true, noDefaultInfinity: true }), { minLength: 1, maxLength: 20 }), (values) => {
        const text = writeCsv(
          ['v'],
          values.map((v) => [v]),
        );
        const cells = readBack(text)
          .slice(1)
          .map((r) => r[0] ?? '');
        expect(cells.some((c) => c.startsWith("'"))).toBe(false);
        expect(cells.map(Number)).toEqual(values.map((v) => (v === 0 ? 0 : v)));
      }),
    );
    expect(writeCsv(['kw'], [[-250], [-0], [Number.NaN], [null]])).toBe('kw\r\n-250\r\n0\r\n\r\n\r\n');
  });

  it('reads back any text cell unchanged unless it needed a formula guard', () => {
    fc.assert(
      fc.property(fc.array(fc.string({ unit: 'grapheme', maxLength: 12 }), { minLength: 1, maxLength: 10 }), (texts) => {
        const text = writeCsv(
          ['t'],
          texts.map((s) => [s]),
        );
        const cells = readBack(`${text}`)
          .slice(1)
          .map((r) => r[0] ?? '');
        // Blank cells make blank lines, which the reader skips: compare the non-blank ones.
        expect(cells).toEqual(texts.map(guardTextCell).filter((s) => s !== ''));
      }),
    );
  });
});

describe('guards text cells against formula injection', () => {
  // [S: OWASP CSV Injection page; OWASP ASVS 5.0.0 1.2.10]: cells starting with
  // = + - @ tab CR LF (and NUL, named by ASVS 1.2.10) get a leading single quote.
  it.each([
    ['=HYPERLINK("http://evil.example","click")', `'=HYPERLINK("http://evil.example","click")`],
    ["+1+cmd|' /C calc'!A0", `'+1+cmd|' /C calc'!A0`],
    ['-2+3', "'-2+3"],
    ['@SUM(1,2)', "'@SUM(1,2)"],
    ['\t=1+1', "'\t=1+1"],
    ['\r=1+1', "'\r=1+1"],
    ['\n=1+1', "'\n=1+1"],
    ['\u0000=1+1', "'=1+1"],
  ])('prefixes %j', (input, expected) => {
    expect(guardTextCell(input)).toBe(expected);
  });

  it.each(['Harbour Road site', 'approved', 'a = b', '1-2', "'already quoted", ''])('leaves %j alone', (input) => {
    expect(guardTextCell(input)).toBe(input);
  });

  it('guards a dangerous cell and still quotes it per RFC 4180 when it holds a comma', () => {
    expect(writeCsv(['name'], [['=SUM(A1,A2)']])).toBe(`name\r\n"'=SUM(A1,A2)"\r\n`);
  });

  it('drops control characters that are not text, but keeps tab, CR and LF inside a cell', () => {
    expect(guardTextCell('a\u0000b\u0007c')).toBe('abc');
    expect(guardTextCell('a\tb\r\nc')).toBe('a\tb\r\nc');
  });
});
