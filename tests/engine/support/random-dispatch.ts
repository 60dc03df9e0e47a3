// Seeded random dispatch problems, one generator per model variant of DESIGN
// section 3, for comparing the engine with independent LP solvers. Small (4–24
// steps) so that hundreds of solves per variant stay quick. Every problem is
// feasible and bounded by construction (grid limits cover the site's own net
// load; export above import only with both grid limits set).
import type { DispatchProblem, TerminalRule } from '../../../server/engine/types';
import { battery } from './problem-builder';

/** xorshift32: tiny, seeded, so a failing case can be replayed from its seed. */
export function seeded(seed: number): () => number {
  let x = (seed * 2654435761) >>> 0 || 1;
  return () => {
    x ^= x << 13;
    x >>>= 0;
    x ^= x >>> 17;
    x ^= x << 5;
    x >>>= 0;
    return x / 4294967296;
  };
}

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
  const r = seeded(seed);
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
