// The dispatch LP of DESIGN section 3 written out a second time, independently of
// the engine's model builder: named variables (c_t, d_t, m_t, x_t, e_t, peak),
// never folding the grid away, then handed to two independent LP solvers from
// the npm registry: javascript-lp-solver 1.0.3 (pure JavaScript simplex) and
// glpk.js 5.0.0 (GLPK compiled to WebAssembly).
import solver from 'javascript-lp-solver';
import GLPK from 'glpk.js/node';
import type { DispatchProblem } from '../../../server/engine/types';

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
}

export interface ReferenceOptions {
  /** Energy (kWh) handed to the battery at the end of step `step`: added to the right side of its SoC row. */
  readonly inject?: { readonly step: number; readonly kwh: number };
}

export function referenceLp(p: DispatchProblem, options: ReferenceOptions = {}): ReferenceLp {
  const b = p.battery;
  const dt = p.stepHours;
  const n = p.priceImport.length;
  const keep = 1 - (b.selfDischargePctPerHour / 100) * dt;
  const eMin = (b.energyKwh * b.socMinPct) / 100;
  const eMax = (b.energyKwh * b.socMaxPct) / 100;
  const cost = new Map<string, number>();
  const box = new Map<string, readonly [number, number]>();
  const rows: Row[] = [];
  box.set('e0', p.freeInitialEnergy ? [eMin, eMax] : [p.initialEnergyKwh, p.initialEnergyKwh]);
  for (let t = 0; t < n; t++) {
    box.set(`c${t}`, [0, b.powerChargeKw]);
    box.set(`d${t}`, [0, b.powerDischargeKw]);
    box.set(`m${t}`, [0, p.site.importLimitKw ?? Infinity]);
    box.set(`x${t}`, [0, p.site.exportLimitKw ?? Infinity]);
    box.set(`e${t + 1}`, [eMin, eMax]);
    cost.set(`m${t}`, (p.priceImport[t]! * dt) / 1000);
    cost.set(`x${t}`, (-p.priceExport[t]! * dt) / 1000);
    cost.set(`d${t}`, (b.degradationCostPerMwh * dt) / 1000);
    rows.push({
      name: `soc${t}`,
      terms: [
        [`e${t + 1}`, 1],
        [`e${t}`, -keep],
        [`c${t}`, -b.efficiencyCharge * dt],
        [`d${t}`, dt / b.efficiencyDischarge],
      ],
      lo: options.inject?.step === t ? options.inject.kwh : 0,
      hi: options.inject?.step === t ? options.inject.kwh : 0,
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
  if (rule.kind === 'cyclic')
    rows.push({
      name: 'end',
      terms: [
        [`e${n}`, 1],
        ['e0', -1],
      ],
      lo: 0,
      hi: 0,
    });
  if (rule.kind === 'target')
    rows.push({ name: 'end', terms: [[`e${n}`, 1]], lo: (b.energyKwh * rule.socPct) / 100, hi: Infinity });
  if (rule.kind === 'steady-value') cost.set(`e${n}`, -rule.valuePerMwh / 1000);
  return { cost, box, rows };
}

export interface ReferenceOutcome {
  readonly status: 'optimal' | 'other';
  readonly objective: number;
}

/** javascript-lp-solver: bounds become constraints; all variables are ≥ 0 here. */
export function solveWithJsLpSolver(lp: ReferenceLp): ReferenceOutcome {
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
  // Solve's declared return type is unknown; the fields read here are documented in its README.
  const result = solver.Solve({ optimize: 'cost', opType: 'min', constraints, variables }) as {
    feasible: boolean;
    bounded?: boolean;
    result: number;
  };
  return result.feasible && result.bounded !== false
    ? { status: 'optimal', objective: result.result }
    : { status: 'other', objective: NaN };
}

function glpkBounds(lo: number, hi: number) {
  if (lo === hi) return { type: glpk.GLP_FX, lb: lo, ub: hi };
  if (Number.isFinite(lo) && Number.isFinite(hi)) return { type: glpk.GLP_DB, lb: lo, ub: hi };
  if (Number.isFinite(lo)) return { type: glpk.GLP_LO, lb: lo, ub: 0 };
  return { type: glpk.GLP_UP, lb: 0, ub: hi };
}

/** glpk.js, called directly with the named model. */
export function solveWithGlpkDirect(lp: ReferenceLp): ReferenceOutcome {
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
    { msglev: glpk.GLP_MSG_OFF },
  );
  return result.result.status === glpk.GLP_OPT
    ? { status: 'optimal', objective: result.result.z }
    : { status: 'other', objective: NaN };
}
