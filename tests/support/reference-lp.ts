// The independent reference for every optimality check: the dispatch LP of
// docs/model.md written out a second time, not through the engine's model
// builder, with named variables (c_t, d_t, m_t, x_t, e_t, peak) and the grid never
// folded away, then handed to two independent LP solvers from the npm registry:
// glpk.js 5.0.0 (GLPK compiled to WebAssembly) and javascript-lp-solver 1.0.3 (a
// pure-JavaScript simplex). Model [S: Hashmi et al. 2019, arXiv 1905.00418;
// Bradbury et al. 2014]:
//   min Σ (π_imp·m − π_exp·x + c_deg·d)·Δt/1000 + D·peak − λ_end·e_N/1000
//   e_{t+1} = (1 − σΔt)·e_t + η_ch·Δt·c_t − Δt/η_dis·d_t,  E_min ≤ e_{t+1} ≤ E_max
//   m_t − x_t − c_t + d_t = L_t − G_t,  0 ≤ c ≤ P_ch, 0 ≤ d ≤ P_dis, 0 ≤ m ≤ M_max, 0 ≤ x ≤ X_max
import solver from 'javascript-lp-solver';
import GLPK from 'glpk.js/node';
import type { DispatchProblem } from '../../server/engine/types';

const glpk = await GLPK();

interface Row {
  readonly name: string;
  readonly terms: readonly (readonly [string, number])[];
  readonly lo: number;
  readonly hi: number;
}

export interface ReferenceLp {
  readonly cost: ReadonlyMap<string, number>;
  readonly box: ReadonlyMap<string, readonly [number, number]>;
  readonly rows: readonly Row[];
  /** Steps N: the energies are e0 … e{N}. */
  readonly steps: number;
}

/** Changes to the problem for finite differences and certificates. */
export interface LpTweaks {
  /** Replace the initial energy (kWh); a cyclic end stays at the problem's own initial energy. */
  readonly initialEnergyKwh?: number;
  /** Inject `deltaKwh` into the SoC equation of step `step` (its right-hand side). */
  readonly inject?: { readonly step: number; readonly deltaKwh: number };
  /** Fix e_1, e_2, … to these energies (kWh): the first decisions of another plan. */
  readonly fixSocKwh?: readonly number[];
}

export function referenceLp(p: DispatchProblem, tweaks: LpTweaks = {}): ReferenceLp {
  const b = p.battery;
  const dt = p.stepHours;
  const n = p.priceImport.length;
  const keep = 1 - (b.selfDischargePctPerHour / 100) * dt;
  const eMin = (b.energyKwh * b.socMinPct) / 100;
  const eMax = (b.energyKwh * b.socMaxPct) / 100;
  const cost = new Map<string, number>();
  const box = new Map<string, readonly [number, number]>();
  const rows: Row[] = [];
  const e0 = tweaks.initialEnergyKwh ?? p.initialEnergyKwh;
  box.set('e0', p.freeInitialEnergy ? [eMin, eMax] : [e0, e0]);
  for (let t = 0; t < n; t++) {
    const fixed = tweaks.fixSocKwh?.[t];
    box.set(`c${t}`, [0, b.powerChargeKw]);
    box.set(`d${t}`, [0, b.powerDischargeKw]);
    box.set(`m${t}`, [0, p.site.importLimitKw ?? Infinity]);
    box.set(`x${t}`, [0, p.site.exportLimitKw ?? Infinity]);
    box.set(`e${t + 1}`, fixed === undefined ? [eMin, eMax] : [fixed, fixed]);
    cost.set(`m${t}`, (p.priceImport[t]! * dt) / 1000);
    cost.set(`x${t}`, (-p.priceExport[t]! * dt) / 1000);
    cost.set(`d${t}`, (b.degradationCostPerMwh * dt) / 1000);
    const injected = tweaks.inject?.step === t ? tweaks.inject.deltaKwh : 0;
    rows.push({
      name: `soc${t}`,
      terms: [
        [`e${t + 1}`, 1],
        [`e${t}`, -keep],
        [`c${t}`, -b.efficiencyCharge * dt],
        [`d${t}`, dt / b.efficiencyDischarge],
      ],
      lo: injected,
      hi: injected,
    });
    const net = p.loadKw[t]! - p.generationKw[t]!;
    rows.push({
      name: `bal${t}`,
      terms: [
        [`m${t}`, 1],
        [`x${t}`, -1],
        [`c${t}`, -1],
        [`d${t}`, 1],
      ],
      lo: net,
      hi: net,
    });
  }
  if (p.site.demandChargePerKw !== null) {
    box.set('peak', [0, Infinity]);
    cost.set('peak', p.site.demandChargePerKw);
    for (let t = 0; t < n; t++)
      rows.push({
        name: `pk${t}`,
        terms: [
          ['peak', 1],
          [`m${t}`, -1],
        ],
        lo: 0,
        hi: Infinity,
      });
  }
  if (b.maxCyclesPerDay !== null) {
    for (const day of new Set(p.dayIndex)) {
      const terms = p.dayIndex.flatMap((d, t) => (d === day ? [[`d${t}`, dt] as const] : []));
      rows.push({ name: `cap${day}`, terms, lo: -Infinity, hi: b.maxCyclesPerDay * (eMax - eMin) });
    }
  }
  const rule = p.terminal;
  // A cyclic end returns to the start: a free start moves with it, a given start is the problem's own.
  if (rule.kind === 'cyclic' && p.freeInitialEnergy)
    rows.push({
      name: 'end',
      terms: [
        [`e${n}`, 1],
        ['e0', -1],
      ],
      lo: 0,
      hi: 0,
    });
  if (rule.kind === 'cyclic' && !p.freeInitialEnergy)
    rows.push({ name: 'end', terms: [[`e${n}`, 1]], lo: p.initialEnergyKwh, hi: p.initialEnergyKwh });
  if (rule.kind === 'target')
    rows.push({ name: 'end', terms: [[`e${n}`, 1]], lo: (b.energyKwh * rule.socPct) / 100, hi: Infinity });
  if (rule.kind === 'steady-value') cost.set(`e${n}`, -rule.valuePerMwh / 1000);
  return { cost, box, rows, steps: n };
}

export interface ReferenceOutcome {
  readonly status: 'optimal' | 'infeasible' | 'other';
  /** Cost including degradation and demand charge, minus any steady-value terminal value. */
  readonly objective: number;
  /** e_0 … e_N, kWh (empty unless optimal). */
  readonly socKwh: readonly number[];
}

const energies = (lp: ReferenceLp, value: (name: string) => number) =>
  Array.from({ length: lp.steps + 1 }, (_, t) => value(`e${t}`));

/** javascript-lp-solver: bounds become constraints; all variables are ≥ 0 here. */
export function solveLpWithJsLpSolver(lp: ReferenceLp): ReferenceOutcome {
  const constraints: Record<string, { min?: number; max?: number; equal?: number }> = {};
  const variables: Record<string, Record<string, number>> = {};
  for (const [name, [lo, hi]] of lp.box) {
    variables[name] = { cost: lp.cost.get(name) ?? 0 };
    if (lo === hi) {
      constraints[`fix_${name}`] = { equal: lo };
    } else {
      constraints[`box_${name}`] = { ...(lo > 0 ? { min: lo } : {}), ...(Number.isFinite(hi) ? { max: hi } : {}) };
    }
    variables[name][lo === hi ? `fix_${name}` : `box_${name}`] = 1;
  }
  for (const row of lp.rows) {
    constraints[row.name] =
      row.lo === row.hi
        ? { equal: row.lo }
        : { ...(Number.isFinite(row.lo) ? { min: row.lo } : {}), ...(Number.isFinite(row.hi) ? { max: row.hi } : {}) };
    for (const [v, coef] of row.terms) variables[v]![row.name] = (variables[v]![row.name] ?? 0) + coef;
  }
  // Solve's declared return type is unknown; the fields read here are documented in its README
  // (variables at zero are left out of the result).
  const result = solver.Solve({ optimize: 'cost', opType: 'min', constraints, variables }) as Record<string, number> & {
    feasible: boolean;
    bounded?: boolean;
    result: number;
  };
  if (!result.feasible) return { status: 'infeasible', objective: NaN, socKwh: [] };
  if (result.bounded === false) return { status: 'other', objective: NaN, socKwh: [] };
  return { status: 'optimal', objective: result.result, socKwh: energies(lp, (name) => result[name] ?? 0) };
}

function glpkBounds(lo: number, hi: number) {
  if (lo === hi) return { type: glpk.GLP_FX, lb: lo, ub: hi };
  if (Number.isFinite(lo) && Number.isFinite(hi)) return { type: glpk.GLP_DB, lb: lo, ub: hi };
  if (Number.isFinite(lo)) return { type: glpk.GLP_LO, lb: lo, ub: 0 };
  return { type: glpk.GLP_UP, lb: 0, ub: hi };
}

/** glpk.js, called directly with the named model; without its presolver unless asked (it reports infeasibility apart). */
export function solveLpWithGlpk(lp: ReferenceLp, options: { presolve?: boolean } = {}): ReferenceOutcome {
  const result = glpk.solve(
    {
      name: 'reference',
      objective: { direction: glpk.GLP_MIN, name: 'cost', vars: [...lp.cost].map(([name, coef]) => ({ name, coef })) },
      subjectTo: lp.rows.map((row) => ({
        name: row.name,
        vars: row.terms.map(([name, coef]) => ({ name, coef })),
        bnds: glpkBounds(row.lo, row.hi),
      })),
      bounds: [...lp.box].map(([name, [lo, hi]]) => ({ name, ...glpkBounds(lo, hi) })),
    },
    { msglev: glpk.GLP_MSG_OFF, presol: options.presolve ?? false },
  );
  const status = result.result.status;
  if (status === glpk.GLP_NOFEAS || status === glpk.GLP_INFEAS) return { status: 'infeasible', objective: NaN, socKwh: [] };
  if (status !== glpk.GLP_OPT) return { status: 'other', objective: NaN, socKwh: [] };
  return { status: 'optimal', objective: result.result.z, socKwh: energies(lp, (name) => result.result.vars[name] ?? NaN) };
}

/** The problem (with tweaks) solved by GLPK: the reference optimum of the exact dynamic program's checks. */
export function solveWithGlpk(p: DispatchProblem, tweaks: LpTweaks = {}): ReferenceOutcome {
  return solveLpWithGlpk(referenceLp(p, tweaks));
}

/** A pure-arbitrage battery over a price series (no site, no grid limits, free end). */
export interface ArbitrageCase {
  prices: readonly number[];
  stepHours: number;
  powerKw: number;
  energyKwh: number;
  socMinPct: number;
  socMaxPct: number;
  etaCharge: number;
  etaDischarge: number;
  initialKwh: number;
}

/** The optimal profit (currency) over the whole series with a free end, by javascript-lp-solver. */
export function optimalArbitrageProfit(c: ArbitrageCase): number {
  const zeros = c.prices.map(() => 0);
  const outcome = solveLpWithJsLpSolver(
    referenceLp({
      stepHours: c.stepHours,
      timesMs: c.prices.map((_, t) => t * c.stepHours * 3_600_000),
      priceImport: c.prices,
      priceExport: c.prices,
      loadKw: zeros,
      generationKw: zeros,
      battery: {
        powerChargeKw: c.powerKw,
        powerDischargeKw: c.powerKw,
        energyKwh: c.energyKwh,
        socMinPct: c.socMinPct,
        socMaxPct: c.socMaxPct,
        socInitialPct: (100 * c.initialKwh) / c.energyKwh,
        efficiencyCharge: c.etaCharge,
        efficiencyDischarge: c.etaDischarge,
        selfDischargePctPerHour: 0,
        degradationCostPerMwh: 0,
        maxCyclesPerDay: null,
      },
      site: { timezone: 'UTC', importLimitKw: null, exportLimitKw: null, demandChargePerKw: null },
      initialEnergyKwh: c.initialKwh,
      terminal: { kind: 'free' },
      dayIndex: zeros,
    }),
  );
  if (outcome.status !== 'optimal') throw new Error('the independent LP has no optimum');
  return -outcome.objective;
}
