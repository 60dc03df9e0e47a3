/**
 * Puts the profiles of a run (prices, optional export prices, load, generation)
 * on one regular grid: the finest step among them, over the period they all
 * cover. Coarser profiles are held constant within their intervals (prices and
 * average powers are per-interval values). The local clock of every step comes
 * with it, for local days and clock slots.
 */
import type { BatteryParams, DispatchProblem, SiteParams } from '../types';
import type { InputIssue } from '../model/validate-battery';
import { validateBattery, validateSite } from '../model/validate-battery';
import { localClock, type LocalClock } from '../time/zone-offsets';
import { limitProfiles, sampleLimits } from './limit-inputs';

export interface ProfileSeries {
  /** UTC epoch ms of the start of the first interval. */
  readonly startMs: number;
  readonly stepMinutes: number;
  readonly values: readonly number[];
}

export interface DispatchInputs {
  readonly battery: BatteryParams;
  readonly site: SiteParams;
  /** Import price, currency/MWh; also the export price unless exportPrices is given. */
  readonly prices: ProfileSeries;
  readonly exportPrices?: ProfileSeries;
  /** Site load, kW average per interval. */
  readonly load?: ProfileSeries;
  /** On-site generation, kW average per interval. */
  readonly generation?: ProfileSeries;
  /** Share (0–1) of the battery's power ratings usable per interval (DESIGN section 3.3). */
  readonly availability?: ProfileSeries;
  /** Availability prices of upward and downward reserve, currency/MW/h. */
  readonly reserveUpPrices?: ProfileSeries;
  readonly reserveDownPrices?: ProfileSeries;
  /** Delivery duration the energy headroom of held reserve must cover, hours. */
  readonly reserveHours?: number;
}

/** The profiles on one grid: the series of a DispatchProblem for the whole period, plus its local clock. */
export interface AlignedInputs extends Pick<
  DispatchProblem,
  | 'battery'
  | 'site'
  | 'stepHours'
  | 'timesMs'
  | 'priceImport'
  | 'priceExport'
  | 'loadKw'
  | 'generationKw'
  | 'availability'
  | 'reserveUpPrice'
  | 'reserveDownPrice'
  | 'reserveHours'
> {
  readonly stepMinutes: number;
  readonly clock: LocalClock;
  /** Plain-words notes about the alignment (e.g. the period was shortened). */
  readonly notes: readonly string[];
}

export type Aligned = { ok: true; inputs: AlignedInputs } | { ok: false; issue: InputIssue };

const MINUTE_MS = 60_000;
const endOf = (p: ProfileSeries) => p.startMs + p.values.length * p.stepMinutes * MINUTE_MS;

function sample(p: ProfileSeries, timesMs: readonly number[]): number[] {
  const stepMs = p.stepMinutes * MINUTE_MS;
  return timesMs.map((ms) => p.values[Math.floor((ms - p.startMs) / stepMs)]!);
}

export function alignInputs(inputs: DispatchInputs): Aligned {
  const battery = validateBattery(inputs.battery);
  if (battery) return { ok: false, issue: battery };
  const site = validateSite(inputs.site);
  if (site) return { ok: false, issue: site };
  const named: [string, ProfileSeries | undefined][] = [
    ['prices', inputs.prices],
    ['exportPrices', inputs.exportPrices],
    ['load', inputs.load],
    ['generation', inputs.generation],
  ];
  const present = named.filter((entry): entry is [string, ProfileSeries] => entry[1] !== undefined);
  // Limit profiles share the grid's step but do not shorten the period (see limit-inputs.ts).
  const gridded = [...present, ...limitProfiles(inputs)];
  for (const [name, p] of gridded) {
    if (!(p.stepMinutes > 0) || !Number.isInteger(p.stepMinutes) || p.values.length === 0) {
      return { ok: false, issue: { field: name, message: `the ${name} profile is empty or has no whole-minute step` } };
    }
  }
  const stepMinutes = Math.min(...gridded.map(([, p]) => p.stepMinutes));
  const stepMs = stepMinutes * MINUTE_MS;
  for (const [name, p] of gridded) {
    if (p.stepMinutes % stepMinutes !== 0 || (p.startMs - inputs.prices.startMs) % stepMs !== 0) {
      return {
        ok: false,
        issue: {
          field: name,
          message: `the ${name} profile (${p.stepMinutes}-minute steps) does not line up with the ${stepMinutes}-minute grid of the other profiles`,
        },
      };
    }
  }
  const start = Math.max(...present.map(([, p]) => p.startMs));
  const end = Math.min(...present.map(([, p]) => endOf(p)));
  if (end <= start) {
    return { ok: false, issue: { field: present[1]?.[0] ?? 'prices', message: 'the profiles do not overlap in time' } };
  }
  const notes: string[] = [];
  if (start !== inputs.prices.startMs || end !== endOf(inputs.prices)) {
    notes.push(
      `the period was shortened to ${new Date(start).toISOString()} – ${new Date(end).toISOString()}, where every profile has data`,
    );
  }
  const timesMs: number[] = [];
  for (let ms = start; ms < end; ms += stepMs) timesMs.push(ms);
  const zeros = () => timesMs.map(() => 0);
  const priceImport = sample(inputs.prices, timesMs);
  return {
    ok: true,
    inputs: {
      battery: inputs.battery,
      site: inputs.site,
      stepMinutes,
      stepHours: stepMinutes / 60,
      timesMs,
      priceImport,
      priceExport: inputs.exportPrices ? sample(inputs.exportPrices, timesMs) : priceImport,
      loadKw: inputs.load ? sample(inputs.load, timesMs) : zeros(),
      generationKw: inputs.generation ? sample(inputs.generation, timesMs) : zeros(),
      clock: localClock(inputs.site.timezone, timesMs),
      notes,
      ...sampleLimits(inputs, timesMs),
    },
  };
}
