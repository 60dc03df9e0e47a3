/**
 * The profiles of the operating limits (availability, reserve prices) on the
 * grid of the other profiles. They share the grid's step but never shorten the
 * period: where one does not cover a step its value is NaN, and the validator
 * then names the part of the window it misses (a reserve price missing inside a
 * plan's window is an error, not a silent zero).
 */
import type { DispatchProblem } from '../types';
import type { DispatchInputs, ProfileSeries } from './align-inputs';

const MINUTE_MS = 60_000;

type LimitFields = Pick<DispatchProblem, 'availability' | 'reserveUpPrice' | 'reserveDownPrice' | 'reserveHours'>;

/** The limit profiles given, by the name used in messages. */
export function limitProfiles(inputs: DispatchInputs): [string, ProfileSeries][] {
  const named: [string, ProfileSeries | undefined][] = [
    ['availability', inputs.availability],
    ['reserveUpPrices', inputs.reserveUpPrices],
    ['reserveDownPrices', inputs.reserveDownPrices],
  ];
  return named.filter((entry): entry is [string, ProfileSeries] => entry[1] !== undefined);
}

/** Values at the given step starts; NaN outside the profile. */
function sampleOrNaN(p: ProfileSeries, timesMs: readonly number[]): number[] {
  const stepMs = p.stepMinutes * MINUTE_MS;
  return timesMs.map((ms) => {
    const i = Math.floor((ms - p.startMs) / stepMs);
    return i >= 0 && i < p.values.length ? p.values[i]! : NaN;
  });
}

/** The limit series of the aligned grid (only those given). */
export function sampleLimits(inputs: DispatchInputs, timesMs: readonly number[]): LimitFields {
  return {
    ...(inputs.availability ? { availability: sampleOrNaN(inputs.availability, timesMs) } : {}),
    ...(inputs.reserveUpPrices ? { reserveUpPrice: sampleOrNaN(inputs.reserveUpPrices, timesMs) } : {}),
    ...(inputs.reserveDownPrices ? { reserveDownPrice: sampleOrNaN(inputs.reserveDownPrices, timesMs) } : {}),
    ...(inputs.reserveHours !== undefined ? { reserveHours: inputs.reserveHours } : {}),
  };
}

/** The limit series of steps [from, to) of aligned inputs, for a dispatch problem. */
export function sliceLimits(inputs: LimitFields, from: number, to: number): LimitFields {
  return {
    ...(inputs.availability ? { availability: inputs.availability.slice(from, to) } : {}),
    ...(inputs.reserveUpPrice ? { reserveUpPrice: inputs.reserveUpPrice.slice(from, to) } : {}),
    ...(inputs.reserveDownPrice ? { reserveDownPrice: inputs.reserveDownPrice.slice(from, to) } : {}),
    ...(inputs.reserveHours !== undefined ? { reserveHours: inputs.reserveHours } : {}),
  };
}
