/**
 * The upload options schema shared with the route, the unit list, and the
 * promise that the reader runs in the browser as well as in Node.
 */
import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ACCEPTED_UNITS, CANONICAL_UNIT, canonicalFactor } from '../../shared/profile-csv/profile-units';
import { profileUploadOptionsSchema } from '../../shared/schemas/profile-upload';

describe('upload options schema', () => {
  it('reads multipart strings "true"/"false" as booleans and defaults both flags to false', () => {
    expect(profileUploadOptionsSchema.parse({ kind: 'load', unit: 'MW', fillGaps: 'true', intervalEnding: 'false' })).toEqual({
      kind: 'load',
      unit: 'MW',
      fillGaps: true,
      intervalEnding: false,
    });
    expect(profileUploadOptionsSchema.parse({ kind: 'price', unit: 'currency/kWh' })).toMatchObject({
      fillGaps: false,
      intervalEnding: false,
    });
  });

  it('rejects a unit that does not fit the kind, on the unit field', () => {
    const result = profileUploadOptionsSchema.safeParse({ kind: 'generation', unit: 'currency/MWh' });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]).toMatchObject({ path: ['unit'], message: expect.stringMatching(/kW, MW, kWh, MWh/) });
  });

  it('rejects an unknown kind', () => {
    expect(profileUploadOptionsSchema.safeParse({ kind: 'wind', unit: 'kW' }).success).toBe(false);
  });
});

describe('units', () => {
  it('lists price units per MWh and per kWh, and power or energy per interval for load and generation', () => {
    expect(ACCEPTED_UNITS).toEqual({
      price: ['currency/MWh', 'currency/kWh'],
      load: ['kW', 'MW', 'kWh', 'MWh'],
      generation: ['kW', 'MW', 'kWh', 'MWh'],
    });
    expect(CANONICAL_UNIT).toEqual({ price: 'currency/MWh', load: 'kW', generation: 'kW' });
  });

  it('converts energy per interval by the step: 1 kWh per 5 minutes is 12 kW on average', () => {
    // 1 kWh / (5/60 h) = 12 kW [D].
    expect(canonicalFactor('kWh', 5)).toBeCloseTo(12, 12);
    expect(canonicalFactor('MWh', 60)).toBe(1000);
  });
});

describe('browser safety', () => {
  it('imports nothing Node-only in shared/profile-csv', () => {
    const dir = path.resolve(import.meta.dirname, '../../shared/profile-csv');
    for (const file of readdirSync(dir).filter((f) => f.endsWith('.ts'))) {
      const source = readFileSync(path.join(dir, file), 'utf8');
      const imports = [...source.matchAll(/from '([^']+)'/g)].map((m) => m[1]);
      for (const spec of imports) expect(spec, `${file} imports ${spec}`).toMatch(/^(\.\/|papaparse$|@date-fns\/tz$|date-fns$)/);
      expect(source, file).not.toMatch(/\b(process\.|Buffer\b|require\()/);
    }
  });
});
