/** Small helpers shared by the profile CSV tests. */
import { expect } from 'vitest';
import {
  parseProfileCsv,
  type ParseProfileOptions,
  type ParsedProfile,
  type ProfileIssue,
} from '../../shared/profile-csv/parse-profile-csv';

export const BERLIN = 'Europe/Berlin';
export const NEW_YORK = 'America/New_York';

export const PRICE: ParseProfileOptions = { kind: 'price', unit: 'currency/MWh', timezone: BERLIN };

/** Lines joined with LF and a final line end, as most exports write them. */
export function csv(...lines: string[]): string {
  return `${lines.join('\n')}\n`;
}

export function parse(text: string, options: Partial<ParseProfileOptions> = {}) {
  return parseProfileCsv(text, { ...PRICE, ...options });
}

export function accepted(text: string, options: Partial<ParseProfileOptions> = {}): ParsedProfile {
  const result = parse(text, options);
  if (!result.ok) throw new Error(`expected the file to be accepted, got ${JSON.stringify(result.issues)}`);
  return result.profile;
}

export function rejected(text: string, options: Partial<ParseProfileOptions> = {}): { issues: ProfileIssue[]; hint: string } {
  const result = parse(text, options);
  if (result.ok) throw new Error(`expected the file to be rejected, got ${JSON.stringify(result.profile.notes)}`);
  return result;
}

/** Asserts the file is rejected with exactly these lines, each message matching its pattern. */
export function expectIssues(
  text: string,
  expected: [line: number, message: RegExp][],
  options: Partial<ParseProfileOptions> = {},
) {
  const { issues, hint } = rejected(text, options);
  expect(issues.map((i) => i.line)).toEqual(expected.map(([line]) => line));
  expected.forEach(([, pattern], k) => expect(issues[k]?.message).toMatch(pattern));
  expect(hint).toMatch(/Nothing was stored/);
  return { issues, hint };
}

/** Epoch ms of an RFC 3339 time with offset (Date.parse reads the offset form exactly, ECMA-262 Date Time String Format). */
export const at = (rfc3339: string): number => Date.parse(rfc3339);

export const HOUR_MS = 3_600_000;
