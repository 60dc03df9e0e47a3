/** Helpers for the profile upload tests: sample files and independent readings of CSV text. */
import { readFileSync } from 'node:fs';
import path from 'node:path';

export const sampleDir = path.resolve(import.meta.dirname, '..', '..', 'sample-data');
export const sample = (name: string): Buffer => readFileSync(path.join(sampleDir, name));

/**
 * The value column of a simple CSV read without the app's reader: split on line
 * ends, drop the header, take the column named `column` and read numbers with
 * Number() (a decimal comma swapped for a point when `decimalComma`).
 */
export function readColumn(bytes: Buffer, column: string, delimiter = ',', decimalComma = false): number[] {
  const lines = bytes
    .toString('utf8')
    .replace(/^\uFEFF/, '')
    .split(/\r?\n/)
    .filter((l) => l.trim() !== '');
  const header = (lines[0] ?? '').split(delimiter);
  const index = header.indexOf(column);
  if (index < 0) throw new Error(`no column ${column} in ${header.join(delimiter)}`);
  return lines.slice(1).map((line) => {
    const cell = line.split(delimiter)[index] ?? '';
    return Number(decimalComma ? cell.replace(',', '.') : cell);
  });
}
