// Seeded one-day inputs for checks of the steady cycle. With exactly one local
// day of data the representative day is the data itself, so the steady LP can
// be written out again in the test (reference-lp.ts) without the engine's
// averaging or model builder.
import { alignInputs, type AlignedInputs } from '../../../server/engine/inputs/align-inputs';
import type { DispatchProblem } from '../../../server/engine/types';
import { battery } from './problem-builder';
import { xorshiftRandom as seeded } from '../../support/seeded-random';

export interface SteadyCaseOptions {
  readonly stepMinutes: 60 | 15;
  /** η_ch = η_dis = 1, no self-discharge, no degradation. */
  readonly lossless: boolean;
  /** Site load and generation, a lower export price and grid limits (the LP keeps grid variables). */
  readonly site?: boolean;
  /** A coupling across slots: a daily throughput cap or a demand charge. */
  readonly coupling?: 'cap' | 'demand';
}

export interface SteadyCase {
  readonly inputs: AlignedInputs;
  /** The steady LP as DESIGN section 3 states it: e_0 free, e_N = e_0, over the one day. */
  readonly problem: DispatchProblem;
}

export function randomSteadyCase(seed: number, options: SteadyCaseOptions): SteadyCase {
  const r = seeded(seed);
  const span = (lo: number, hi: number) => lo + (hi - lo) * r();
  const n = (24 * 60) / options.stepMinutes;
  const stepHours = options.stepMinutes / 60;
  const energyKwh = Math.round(span(500, 4000));
  const power = Math.round(energyKwh * span(0.15, 1.2));
  const eta = options.lossless ? 1 : span(0.8, 0.97);
  // Prices rounded to 5 repeat often, so idle slots with tied values come up as well as trading ones.
  const coarse = r() < 0.5;
  const phase = span(0, 24);
  const priceImport = Array.from({ length: n }, (_, t) => {
    const hour = t * stepHours;
    const raw =
      60 + 30 * Math.sin((2 * Math.PI * (hour - phase)) / 24) + 15 * Math.sin((4 * Math.PI * hour) / 24) + span(-12, 12);
    return coarse ? 5 * Math.round(raw / 5) : Math.round(100 * raw) / 100;
  });
  const site = options.site === true;
  const loadKw = priceImport.map(() => (site ? span(0, 1.2) * power : 0));
  const generationKw = priceImport.map(() => (site && r() < 0.4 ? span(0, 1) * power : 0));
  const priceExport = priceImport.map((p) => (site ? p - span(0, 25) : p));
  const net = loadKw.map((l, t) => l - generationKw[t]!);
  const b = battery({
    powerChargeKw: power,
    powerDischargeKw: r() < 0.5 ? power : Math.round(energyKwh * span(0.15, 1.2)),
    energyKwh,
    socMinPct: r() < 0.5 ? 0 : Math.round(span(5, 20)),
    socMaxPct: r() < 0.5 ? 100 : Math.round(span(80, 95)),
    socInitialPct: 50,
    efficiencyCharge: eta,
    efficiencyDischarge: options.lossless ? 1 : r() < 0.5 ? eta : span(0.8, 0.97),
    selfDischargePctPerHour: options.lossless || r() < 0.6 ? 0 : span(0, 1),
    degradationCostPerMwh: options.lossless || r() < 0.6 ? 0 : span(0, 15),
    maxCyclesPerDay: options.coupling === 'cap' ? span(0.3, 1.5) : null,
  });
  const siteParams = {
    timezone: 'UTC',
    importLimitKw: site ? Math.max(...net, 0) + span(0.3, 1.5) * power : null,
    exportLimitKw: site ? Math.max(...net.map((v) => -v), 0) + span(0.3, 1.5) * power : null,
    demandChargePerKw: options.coupling === 'demand' ? span(0.5, 8) : null,
  };
  const startMs = Date.UTC(2026, 2, 2);
  const series = (values: number[]) => ({ startMs, stepMinutes: options.stepMinutes, values });
  const aligned = alignInputs({
    battery: b,
    site: siteParams,
    prices: series(priceImport),
    ...(site ? { exportPrices: series(priceExport), load: series(loadKw), generation: series(generationKw) } : {}),
  });
  if (!aligned.ok) throw new Error(aligned.issue.message);
  const inputs = aligned.inputs;
  return {
    inputs,
    problem: {
      stepHours,
      timesMs: inputs.timesMs,
      priceImport: inputs.priceImport,
      priceExport: inputs.priceExport,
      loadKw: inputs.loadKw,
      generationKw: inputs.generationKw,
      battery: b,
      site: siteParams,
      initialEnergyKwh: 0,
      freeInitialEnergy: true,
      terminal: { kind: 'cyclic' },
      dayIndex: inputs.timesMs.map(() => 0),
    },
  };
}
