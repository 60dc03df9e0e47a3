/**
 * Profile upload benchmark: parse and validate a year of 5-minute data (105 120
 * rows) with parseProfileCsv; the target is ≤ 2 s. The files are generated in
 * memory (invented values). Prints JSON figures. Run: npx tsx scripts/bench-parse.ts
 */
import { loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { parseProfileCsv, type ParseProfileOptions } from '../shared/profile-csv/parse-profile-csv';
import { createZoneClock, formatInstant } from '../shared/profile-csv/zone-clock';

const TIME_ZONE = 'Europe/Berlin';
const STEP_MS = 5 * 60_000;
const ROWS = 105_120; // 365 days × 288 five-minute intervals
const START_MS = Date.parse('2026-01-01T00:00:00+01:00');
const RUNS = 5;

type Variant = { name: string; text: string; options: ParseProfileOptions };

function buildFile(time: (ms: number) => string, delimiter: ',' | ';'): string {
  const lines = [`time${delimiter}price`];
  for (let i = 0; i < ROWS; i += 1) {
    const value = (40 + 30 * Math.sin((2 * Math.PI * i) / 288) - (i % 97 === 0 ? 60 : 0)).toFixed(2);
    lines.push(`${time(START_MS + i * STEP_MS)}${delimiter}${delimiter === ';' ? value.replace('.', ',') : value}`);
  }
  return `${lines.join('\n')}\n`;
}

/**
 * Wall-clock and CPU time per parse. On a shared machine the wall figure
 * includes waiting for a core; the CPU figure (user + system) is the work itself.
 */
function measure({ text, options }: Variant) {
  const wall: number[] = [];
  const cpu: number[] = [];
  let last = parseProfileCsv(text, options);
  for (let run = 0; run < RUNS; run += 1) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    last = parseProfileCsv(text, options);
    wall.push(performance.now() - t0);
    const used = process.cpuUsage(c0);
    cpu.push((used.user + used.system) / 1000);
  }
  const median = (xs: number[]): number => Math.round([...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? 0);
  return {
    medianMs: median(wall),
    minMs: Math.round(Math.min(...wall)),
    medianCpuMs: median(cpu),
    ok: last.ok,
    values: last.ok ? last.profile.values.length : 0,
  };
}

const clock = createZoneClock(TIME_ZONE);
if (clock === null) throw new Error(`${TIME_ZONE} is unknown to this runtime`);
const price = { kind: 'price', unit: 'currency/MWh', timezone: TIME_ZONE } as const;
const variants: Variant[] = [
  { name: 'offsets-comma', text: buildFile((ms) => formatInstant(ms, clock), ','), options: price },
  { name: 'utc-z-comma', text: buildFile((ms) => new Date(ms).toISOString().replace('.000Z', 'Z'), ','), options: price },
  { name: 'offsets-semicolon-decimal-comma', text: buildFile((ms) => formatInstant(ms, clock), ';'), options: price },
  // Local times without offsets: a zone with no DST, since a year of Berlin
  // local times is (rightly) rejected on the autumn day.
  {
    name: 'local-times-asia-tokyo',
    text: buildFile((ms) => new Date(ms + 9 * 3_600_000).toISOString().slice(0, 16), ','),
    options: { ...price, timezone: 'Asia/Tokyo' },
  },
];

const results = variants.map((v) => ({
  variant: v.name,
  rows: ROWS,
  megabytes: Number((new TextEncoder().encode(v.text).length / 1e6).toFixed(2)),
  ...measure(v),
}));
console.log(
  JSON.stringify(
    {
      benchmark: 'parse-profile-csv',
      node: process.version,
      runs: RUNS,
      targetMs: 2000,
      // A shared machine's load shows why wall time can exceed CPU time.
      loadAverage1m: Number((loadavg()[0] ?? 0).toFixed(2)),
      results,
    },
    null,
    2,
  ),
);
