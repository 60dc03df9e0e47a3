/** Helpers for the profile upload tests: sample files, multipart uploads, independent readings of CSV text. */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type TestAgent from 'supertest/lib/agent';

export const sampleDir = path.resolve(import.meta.dirname, '..', '..', 'sample-data');
export const sample = (name: string): Buffer => readFileSync(path.join(sampleDir, name));

export interface UploadFields {
  kind?: string;
  unit?: string;
  name?: string;
  intervalEnding?: boolean;
  fillGaps?: boolean;
  dateOrder?: string;
  decimalSeparator?: string;
}

/** POST /api/sites/:id/profiles as a browser form would send it. */
export function upload(agent: TestAgent, siteId: string, file: Buffer | string, filename: string, fields: UploadFields = {}) {
  const all = { kind: 'price', unit: 'currency/MWh', ...fields };
  let req = agent.post(`/api/sites/${siteId}/profiles`);
  for (const [key, value] of Object.entries(all)) req = req.field(key, String(value));
  return req.attach('file', typeof file === 'string' ? Buffer.from(file, 'utf8') : file, filename);
}

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
