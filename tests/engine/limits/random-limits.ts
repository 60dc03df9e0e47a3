// Seeded random dispatch problems with the operating limits of DESIGN section 3.3,
// one generator per feature and one with all of them, on top of the model
// variants of tests/engine/support/random-dispatch.ts. Every problem stays
// feasible by construction: idling (p = 0, no reserve) meets every limit, the
// grid limits there cover the site's own net load, and a given initial power is
// within one ramp step of 0.
import type { DispatchProblem } from '../../../server/engine/types';
import { randomDispatchProblem, type ModelVariant } from '../support/random-problems';
import { xorshiftRandom as seeded } from '../../support/seeded-random';

export const LIMIT_FEATURES = [
  'reserves',
  'availability',
  'ramp rate',
  'switching cost',
  'ramp and switching from an initial power',
  'all combined',
] as const;
export type LimitFeature = (typeof LIMIT_FEATURES)[number];

/** Base variants that stay feasible at p = 0 (no end target, which may need charging). */
const BASES: readonly ModelVariant[] = [
  'pure arbitrage, free end',
  'cyclic end',
  'steady-value end',
  'site load, generation, grid limits, lower export price',
  'demand charge',
  'daily throughput cap',
  'self-discharge and degradation cost',
  'negative prices',
];

export function randomLimitProblem(feature: LimitFeature, seed: number): DispatchProblem {
  const r = seeded(seed * 7919 + 13);
  const span = (lo: number, hi: number) => lo + (hi - lo) * r();
  const base = randomDispatchProblem(BASES[seed % BASES.length]!, seed);
  const n = base.priceImport.length;
  const all = feature === 'all combined';
  const reserves = feature === 'reserves' || all;
  const availability = feature === 'availability' || all;
  const ramp = feature === 'ramp rate' || feature === 'ramp and switching from an initial power' || all;
  const switching = feature === 'switching cost' || feature === 'ramp and switching from an initial power' || all;
  const fromPower = feature === 'ramp and switching from an initial power' || (all && r() < 0.5);
  const power = Math.max(base.battery.powerChargeKw, base.battery.powerDischargeKw);
  const rampKwPerMin = ramp ? (span(0.05, 0.8) * power) / (60 * base.stepHours) : null;
  const a = Array.from({ length: n }, () => (r() < 0.3 ? Math.round(100 * span(0, 1)) / 100 : 1));
  const step = rampKwPerMin === null ? power : rampKwPerMin * 60 * base.stepHours;
  // |p_{−1}| within one ramp step of 0 and within both ratings, so idling from step 0 on stays feasible.
  const reach = Math.min(step, base.battery.powerChargeKw, base.battery.powerDischargeKw);
  return {
    ...base,
    battery: {
      ...base.battery,
      rampKwPerMin,
      switchingCostPerMw: switching ? span(0.5, 40) : null,
    },
    ...(availability ? { availability: a } : {}),
    ...(reserves
      ? {
          reserveUpPrice: base.priceImport.map(() => Math.round(100 * span(0, 30)) / 100),
          ...(r() < 0.8 ? { reserveDownPrice: base.priceImport.map(() => Math.round(100 * span(0, 20)) / 100) } : {}),
          reserveHours: [0.25, 0.5, 1, 2][Math.floor(r() * 4)]!,
        }
      : {}),
    ...(fromPower ? { initialNetPowerKw: span(-1, 1) * reach } : {}),
  };
}
