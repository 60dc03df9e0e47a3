// The demo scenario's invented data (sample-data/) on one grid, read with the
// shared profile reader as an upload would be.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { decodeProfileBytes, parseProfileCsv } from '../../../shared/profile-csv';
import { alignInputs, type AlignedInputs } from '../../../server/engine/inputs/align-inputs';
import type { BatteryParams, SiteParams } from '../../../server/engine/types';

const DIR = path.resolve(import.meta.dirname, '../../../sample-data');

export function demoInputs(): AlignedInputs {
  const json = <T>(file: string) => JSON.parse(readFileSync(path.join(DIR, file), 'utf8')) as T;
  const site = json<SiteParams>('demo-site.json');
  const read = (file: string, kind: 'price' | 'load' | 'generation', unit: string) => {
    const parsed = parseProfileCsv(decodeProfileBytes(readFileSync(path.join(DIR, file))), {
      kind,
      unit,
      timezone: site.timezone,
    });
    if (!parsed.ok) throw new Error(`${file}: ${parsed.hint}`);
    return parsed.profile;
  };
  const aligned = alignInputs({
    battery: json<BatteryParams>('demo-battery.json'),
    site,
    prices: read('prices-2026-hourly.csv', 'price', 'currency/MWh'),
    load: read('site-load-2026-hourly.csv', 'load', 'kW'),
    generation: read('pv-generation-2026-hourly.csv', 'generation', 'kW'),
  });
  if (!aligned.ok) throw new Error(aligned.issue.message);
  return aligned.inputs;
}
