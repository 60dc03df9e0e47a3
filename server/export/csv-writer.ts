/**
 * A small RFC 4180 writer: records end with CRLF (section 2.1-2.2), a field
 * holding a comma, a double quote, CR or LF is enclosed in double quotes and
 * its quotes are doubled (sections 2.5-2.7), every record has the header's
 * number of fields (section 2.4). The media type is `text/csv` with
 * `header=present` (section 3).
 *
 * Cells are typed: numbers are written as plain decimal numbers (the shortest
 * text that reads back as the same IEEE 754 double, so values round-trip
 * exactly), or with a fixed number of decimals when the cell says so
 * (`fixed(1387.4999999999998, 3)` is 1387.500: the unit's precision, not the
 * solver's rounding noise); text is guarded against formula injection, null
 * is an empty field.
 */
import { guardTextCell } from './formula-guard';

/** A number to write with exactly `decimals` decimals. */
export interface FixedNumber {
  readonly value: number;
  readonly decimals: number;
}

export type CsvCell = number | FixedNumber | string | null;

/** A number cell written with exactly `decimals` decimals (NaN or a missing value: an empty field). */
export const fixed = (value: number | null | undefined, decimals: number): FixedNumber | null =>
  value === null || value === undefined ? null : { value, decimals };

export const CSV_MEDIA_TYPE = 'text/csv; charset=utf-8; header=present';

const CRLF = '\r\n';
const NEEDS_QUOTES = /[",\r\n]/;

export class CsvShapeError extends Error {}

function quote(field: string): string {
  return NEEDS_QUOTES.test(field) ? `"${field.replace(/"/g, '""')}"` : field;
}

export function formatNumberCell(value: number): string {
  // NaN or Infinity in a series means "no value": an empty field, never the word.
  if (!Number.isFinite(value)) return '';
  // String() gives the shortest round-trip form; -0 becomes "0".
  return String(value);
}

/** Exactly `decimals` decimals, rounded half away from zero as toFixed does; never "-0.000". */
export function formatFixedCell(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '';
  const text = value.toFixed(decimals);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

function field(cell: CsvCell): string {
  if (cell === null) return '';
  if (typeof cell === 'number') return formatNumberCell(cell);
  if (typeof cell === 'object') return formatFixedCell(cell.value, cell.decimals);
  return quote(guardTextCell(cell));
}

/** One CSV document: the header (column names are text too) then the rows. */
export function writeCsv(header: readonly string[], rows: Iterable<readonly CsvCell[]>): string {
  const lines: string[] = [header.map((name) => quote(guardTextCell(name))).join(',')];
  let index = 0;
  for (const row of rows) {
    index += 1;
    if (row.length !== header.length) {
      throw new CsvShapeError(
        `Row ${index} has ${row.length} fields but the header has ${header.length} (RFC 4180 section 2.4).`,
      );
    }
    lines.push(row.map(field).join(','));
  }
  return lines.join(CRLF) + CRLF;
}
