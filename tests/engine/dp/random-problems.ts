// Seeded random dispatch problems for the property tests. Small (4–30 steps)
// so that hundreds of GLPK solves per variant stay quick.
import type { DispatchProblem, TerminalRule } from '../../../server/engine/types';

/** mulberry32: a tiny seeded generator, so every failure can be replayed from its seed. */
export function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let x = s;
    x = Math.imul(x ^ (x >>> 15), x | 1);
    x ^= x + Math.imul(x ^ (x >>> 7), x | 61);
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
}

export type Variant =
  | 'asymmetric powers and efficiencies'
  | 'step lengths of 5 to 60 minutes'
  | 'negative prices'
  | 'SoC at a bound at the start'
  | 'every terminal rule'
  | 'site load and generation with grid limits'
  | 'self-discharge and degradation cost';

export const VARIANTS: readonly Variant[] = [
  'asymmetric powers and efficiencies',
  'step lengths of 5 to 60 minutes',
  'negative prices',
  'SoC at a bound at the start',
  'every terminal rule',
  'site load and generation with grid limits',
  'self-discharge and degradation cost',
];

export function randomProblem(variant: Variant, seed: number, steps?: number): DispatchProblem {
  const r = rng(seed);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(r() * xs.length)] as T;
  const between = (lo: number, hi: number): number => lo + (hi - lo) * r();
  const n = steps ?? 4 + Math.floor(r() * 27);
  const stepHours = variant === 'step lengths of 5 to 60 minutes' ? pick([5, 10, 15, 20, 30, 60]) / 60 : 1;
  const energyKwh = between(50, 2000);
  const asym = variant === 'asymmetric powers and efficiencies';
  const powerChargeKw = energyKwh * between(0.1, 1.5);
  const powerDischargeKw = asym ? energyKwh * between(0.1, 1.5) : powerChargeKw;
  const etaC = asym ? pick([1, between(0.6, 1)]) : between(0.85, 1);
  const etaD = asym ? pick([1, between(0.6, 1)]) : etaC;
  const socMinPct = pick([0, between(0, 30)]);
  const socMaxPct = pick([100, between(60, 100)]);
  const emin = (energyKwh * socMinPct) / 100;
  const emax = (energyKwh * socMaxPct) / 100;
  const e0 = variant === 'SoC at a bound at the start' ? pick([emin, emax]) : between(emin, emax);
  const negative = variant === 'negative prices';
  const priceImport: number[] = [];
  const priceExport: number[] = [];
  const loadKw: number[] = [];
  const generationKw: number[] = [];
  const site = variant === 'site load and generation with grid limits';
  for (let t = 0; t < n; t++) {
    const base = negative ? between(-120, 100) : between(-5, 150);
    const pi = Math.round(base * 100) / 100;
    priceImport.push(pi);
    priceExport.push(site ? pi - pick([0, between(0, 40)]) : pi);
    loadKw.push(site ? between(0, 1.2) * powerDischargeKw : 0);
    generationKw.push(site ? pick([0, between(0, 1.5) * powerChargeKw]) : 0);
  }
  const selfDischarge = variant === 'self-discharge and degradation cost';
  const rules: TerminalRule[] = [
    { kind: 'free' },
    { kind: 'cyclic' },
    { kind: 'target', socPct: between(socMinPct, socMaxPct) },
    { kind: 'steady-value', valuePerMwh: between(-20, 150) },
  ];
  const terminal = variant === 'every terminal rule' || asym ? pick(rules) : { kind: 'free' as const };
  return {
    stepHours,
    timesMs: Array.from({ length: n }, (_, t) => Date.UTC(2026, 0, 5) + t * stepHours * 3_600_000),
    priceImport,
    priceExport,
    loadKw,
    generationKw,
    battery: {
      powerChargeKw,
      powerDischargeKw,
      energyKwh,
      socMinPct,
      socMaxPct,
      socInitialPct: (e0 / energyKwh) * 100,
      efficiencyCharge: etaC,
      efficiencyDischarge: etaD,
      selfDischargePctPerHour: selfDischarge ? pick([0, between(0, 5)]) : 0,
      degradationCostPerMwh: selfDischarge || negative ? pick([0, between(0, 30)]) : 0,
      maxCyclesPerDay: null,
    },
    site: {
      timezone: 'UTC',
      importLimitKw: site ? pick([null, between(0.5, 2) * powerChargeKw]) : null,
      exportLimitKw: site ? pick([null, between(0.2, 2) * powerDischargeKw]) : null,
      demandChargePerKw: null,
    },
    initialEnergyKwh: e0,
    terminal,
    dayIndex: Array.from({ length: n }, (_, t) => Math.floor((t * stepHours) / 24)),
  };
}
