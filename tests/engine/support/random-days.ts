// Seeded inputs of a few days: one random day shape (random-steady.ts) repeated
// with noise, so plans and studies see prices near, but not on, the steady cycle.
import { alignInputs, type AlignedInputs } from '../../../server/engine/inputs/align-inputs';
import { randomSteadyCase, type SteadyCaseOptions } from './random-steady';
import { xorshiftRandom as seeded } from '../../support/seeded-random';

export function randomDaysInputs(seed: number, days: number, options: SteadyCaseOptions): AlignedInputs {
  const r = seeded(seed + 1);
  const day = randomSteadyCase(seed, options).inputs;
  const n = day.timesMs.length;
  const noisy = (series: readonly number[], spread: number) =>
    Array.from({ length: n * days }, (_, t) => Math.round(100 * (series[t % n]! + spread * (r() - 0.5))) / 100);
  const series = (values: number[]) => ({ startMs: day.timesMs[0]!, stepMinutes: day.stepMinutes, values });
  const site = options.site === true;
  const priceImport = noisy(day.priceImport, 8);
  const aligned = alignInputs({
    battery: day.battery,
    site: day.site,
    prices: series(priceImport),
    ...(site
      ? {
          // Export stays at or below import, as at a real connection.
          exportPrices: series(priceImport.map((p, t) => Math.min(p, day.priceExport[t % n]!))),
          load: series(Array.from({ length: n * days }, (_, t) => day.loadKw[t % n]!)),
          generation: series(Array.from({ length: n * days }, (_, t) => day.generationKw[t % n]!)),
        }
      : {}),
  });
  if (!aligned.ok) throw new Error(aligned.issue.message);
  return aligned.inputs;
}
