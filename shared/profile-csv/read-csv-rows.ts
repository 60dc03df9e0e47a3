/**
 * Splits the uploaded text into rows with papaparse, keeping for every row the
 * physical line of the file where it starts (quoted fields may span lines), and
 * refusing content that is not CSV text before any parsing.
 */
import Papa from 'papaparse';
import type { IssueList } from './issue-list';

export type Delimiter = ',' | ';';

export interface CsvRow {
  /** Physical line (1-based) where the row starts. */
  readonly line: number;
  readonly fields: readonly string[];
}

export interface CsvTable {
  readonly delimiter: Delimiter;
  readonly header: CsvRow;
  readonly rows: readonly CsvRow[];
  readonly hadByteOrderMark: boolean;
}

// NUL and other C0 controls never appear in CSV text; U+FFFD is what a UTF-8
// decoder puts where the bytes were not valid UTF-8 (WHATWG Encoding standard).
// Tab, line feed and carriage return are ordinary text.
const NOT_TEXT = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F\uFFFD]/;

export function readCsvRows(input: string, issues: IssueList): CsvTable | null {
  const hadByteOrderMark = input.charCodeAt(0) === 0xfeff;
  let text = hadByteOrderMark ? input.slice(1) : input;

  const binaryAt = text.search(NOT_TEXT);
  if (binaryAt >= 0) {
    const line = lineOfOffset(text, binaryAt);
    const what = text.charCodeAt(binaryAt) === 0xfffd ? 'bytes that are not valid UTF-8 text' : 'control bytes (such as NUL)';
    issues.add(
      'file',
      line,
      `Line ${line} contains ${what}: this is not a CSV text file (a spreadsheet, archive or UTF-16 file renamed .csv?). Save the data as CSV (UTF-8).`,
    );
    return null;
  }

  // Mixed CRLF / LF / CR line ends: papaparse detects a single newline style,
  // so make them all LF first. Line numbers are unchanged (a CRLF pair is one break).
  if (text.includes('\r')) text = text.replace(/\r\n?/g, '\n');

  if (text.trim() === '') {
    issues.add('structure', 1, 'The file is empty. Upload a CSV with a header row and one row per interval.');
    return null;
  }

  const delimiter = detectDelimiter(firstNonBlankLine(text));
  const parsed = Papa.parse<string[]>(text, { delimiter, newline: '\n', header: false, skipEmptyLines: false });

  const quoted = text.includes('"');
  const rows: CsvRow[] = [];
  const lineOfRow: number[] = [];
  let line = 1;
  for (const fields of parsed.data) {
    lineOfRow.push(line);
    const startLine = line;
    line += 1;
    // Only a quoted field can hold a line feed.
    if (quoted) for (const field of fields) line += countLineFeeds(field);
    // Trim in place: papaparse's arrays are ours, and a copy per row costs GC time on 100k rows.
    let blank = true;
    for (let i = 0; i < fields.length; i += 1) {
      const field = (fields[i] as string).trim();
      fields[i] = field;
      if (field !== '') blank = false;
    }
    if (!blank) rows.push({ line: startLine, fields });
  }

  for (const error of parsed.errors) {
    const at = error.row === undefined ? 1 : (lineOfRow[error.row] ?? 1);
    if (error.type === 'Quotes') {
      issues.add(
        'structure',
        at,
        `Line ${at} has a quoted field whose quotes do not match (${error.message}). Close each opening " with a closing one, and write a quote inside a quoted field as "".`,
      );
    }
  }

  const [header, ...dataRows] = rows;
  if (header === undefined) {
    issues.add('structure', 1, 'The file is empty. Upload a CSV with a header row and one row per interval.');
    return null;
  }
  return { delimiter, header, rows: dataRows, hadByteOrderMark };
}

/** A semicolon anywhere in the header means a semicolon-separated file (the European spreadsheet export). */
function detectDelimiter(headerLine: string): Delimiter {
  const semicolons = headerLine.split(';').length - 1;
  const commas = headerLine.split(',').length - 1;
  return semicolons > 0 && semicolons >= commas ? ';' : ',';
}

function firstNonBlankLine(text: string): string {
  for (const line of text.split('\n', 50)) if (line.trim() !== '') return line;
  return '';
}

function countLineFeeds(field: string): number {
  let count = 0;
  for (let i = field.indexOf('\n'); i >= 0; i = field.indexOf('\n', i + 1)) count += 1;
  return count;
}

function lineOfOffset(text: string, offset: number): number {
  let line = 1;
  for (let i = 0; i < offset; i += 1) {
    const c = text.charCodeAt(i);
    // CRLF counts once; a lone CR (old Mac line end) counts as a break.
    if (c === 10 || (c === 13 && text.charCodeAt(i + 1) !== 10)) line += 1;
  }
  return line;
}
