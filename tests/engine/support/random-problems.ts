// Seeded random dispatch problems for the property tests, every one a function of
// its seed (tests/support/seeded-random.ts). Two families: `randomProblem` makes
// problems the exact dynamic program takes (4–30 steps), `randomDispatchProblem`
// one per model variant of docs/model.md for the LP paths (4–24 steps). Small, so
// hundreds of independent LP solves per variant stay quick.
import type { DispatchProblem, TerminalRule } from '../../../server/engine/types';
import { seededRandom } from '../../support/seeded-random';
import { battery } from './problem-builder';

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
  const r = seededRandom(seed);
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

/**
 * One problem per model variant, feasible and bounded by construction (grid limits
 * cover the site's own net load; export above import only with both grid limits set).
 */
export const MODEL_VARIANTS = [
  'pure arbitrage, free end',
  'cyclic end',
  'end target',
  'steady-value end',
  'site load, generation, grid limits, lower export price',
  'demand charge',
  'daily throughput cap',
  'self-discharge and degradation cost',
  'negative prices',
  'free start with cyclic end (steady cycle)',
] as const;
export type ModelVariant = (typeof MODEL_VARIANTS)[number];

export function randomDispatchProblem(variant: ModelVariant, seed: number): DispatchProblem {
  const r = seededRandom(seed);
  const span = (lo: number, hi: number) => lo + (hi - lo) * r();
  const n = 4 + Math.floor(r() * 21);
  const stepHours = [0.25, 0.5, 1][Math.floor(r() * 3)]!;
  const energyKwh = Math.round(span(100, 4000));
  const powerChargeKw = Math.round(energyKwh * span(0.2, 1.2));
  const powerDischargeKw = r() < 0.5 ? powerChargeKw : Math.round(energyKwh * span(0.2, 1.2));
  const socMinPct = Math.round(span(0, 20));
  const socMaxPct = Math.round(span(80, 100));
  const emin = (energyKwh * socMinPct) / 100;
  const emax = (energyKwh * socMaxPct) / 100;
  const e0 = span(emin, emax);
  const site = variant === 'site load, generation, grid limits, lower export price' || variant === 'demand charge';
  const negative = variant === 'negative prices';
  const priceImport = Array.from(
    { length: n },
    (_, t) => Math.round(100 * (60 + 35 * Math.sin(t / 2 + seed) + span(-20, 20) - (negative ? span(0, 120) : 0))) / 100,
  );
  const loadKw = Array.from({ length: n }, () => (site ? span(0, 1.5) * powerDischargeKw : 0));
  const generationKw = Array.from({ length: n }, () => (site && r() < 0.5 ? span(0, 1) * powerChargeKw : 0));
  const priceExport = priceImport.map((p) =>
    variant === 'site load, generation, grid limits, lower export price' ? p - span(0, 30) : p,
  );
  const peakNet = Math.max(...loadKw.map((l, t) => l - generationKw[t]!));
  const peakBack = Math.max(...generationKw.map((g, t) => g - loadKw[t]!));
  const terminal: TerminalRule =
    variant === 'cyclic end' || variant === 'free start with cyclic end (steady cycle)'
      ? { kind: 'cyclic' }
      : variant === 'end target'
        ? {
            kind: 'target',
            socPct:
              Math.min(socMaxPct, (100 * Math.min(emax, e0 + 0.5 * n * stepHours * powerChargeKw * 0.8)) / energyKwh) *
              span(0.5, 1),
          }
        : variant === 'steady-value end'
          ? { kind: 'steady-value', valuePerMwh: span(0, 120) }
          : { kind: 'free' };
  return {
    stepHours,
    timesMs: Array.from({ length: n }, (_, t) => Date.UTC(2026, 2, 1) + t * stepHours * 3_600_000),
    priceImport,
    priceExport,
    loadKw,
    generationKw,
    battery: battery({
      ...{ powerChargeKw, powerDischargeKw, energyKwh, socMinPct, socMaxPct, socInitialPct: (100 * e0) / energyKwh },
      ...{ efficiencyCharge: span(0.85, 1), efficiencyDischarge: span(0.85, 1) },
      selfDischargePctPerHour: variant === 'self-discharge and degradation cost' ? span(0, 3) : 0,
      degradationCostPerMwh: variant === 'self-discharge and degradation cost' || negative ? span(0, 25) : 0,
      maxCyclesPerDay: variant === 'daily throughput cap' ? span(0.1, 1) : null,
    }),
    site: {
      timezone: 'UTC',
      importLimitKw: site ? Math.max(0, peakNet) + span(0, 1) * powerChargeKw : null,
      exportLimitKw: site ? Math.max(0, peakBack) + span(0, 1) * powerDischargeKw : null,
      demandChargePerKw: variant === 'demand charge' ? span(0.5, 15) : null,
    },
    initialEnergyKwh: e0,
    terminal,
    dayIndex: Array.from({ length: n }, (_, t) => Math.floor((t * stepHours) / 3)),
    ...(variant === 'free start with cyclic end (steady cycle)' ? { freeInitialEnergy: true } : {}),
  };
}
