/**
 * A small RFC 4180 writer: records end with CRLF (section 2.1-2.2), a field
 * holding a comma, a double quote, CR or LF is enclosed in double quotes and
 * its quotes are doubled (sections 2.5-2.7), every record has the header's
 * number of fields (section 2.4). The media type is `text/csv` with
 * `header=present` (section 3).
 *
 * Cells are typed: numbers are written as plain decimal numbers (the shortest
 * text that reads back as the same IEEE 754 double, so values round-trip
 * exactly), text is guarded against formula injection, null is an empty field.
 */
import { guardTextCell } from './formula-guard';

export type CsvCell = number | string | null;

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

function field(cell: CsvCell): string {
  if (cell === null) return '';
  if (typeof cell === 'number') return formatNumberCell(cell);
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
