// The independent reference for the dynamic program: the dispatch LP of DESIGN
// section 3 written out directly for GLPK (glpk.js 5.0.0, an independent
// general-purpose simplex LP solver from the npm registry), not through the
// engine's own model builder.
import GLPK from 'glpk.js/node';
import type { DispatchProblem } from '../../../server/engine/types';

const glpk = await GLPK();

export interface GlpkOutcome {
  readonly status: 'optimal' | 'infeasible' | 'other';
  /** Objective: cost including degradation, minus the steady-value terminal value. */
  readonly objective: number;
  readonly socKwh: readonly number[];
}

export interface GlpkTweaks {
  /** Replace the initial energy (kWh); a cyclic end stays at the problem's own initial energy. */
  readonly initialEnergyKwh?: number;
  /** Inject `deltaKwh` into the SoC equation of step `step` (its right-hand side). */
  readonly inject?: { readonly step: number; readonly deltaKwh: number };
  /** Fix e_1, e_2, … to these energies (kWh): the first decisions of another plan. */
  readonly fixSocKwh?: readonly number[];
}

type Row = { name: string; vars: { name: string; coef: number }[]; bnds: { type: number; lb: number; ub: number } };

export function solveWithGlpk(p: DispatchProblem, tweaks: GlpkTweaks = {}): GlpkOutcome {
  const n = p.priceImport.length;
  const b = p.battery;
  const dt = p.stepHours;
  const a = 1 - (b.selfDischargePctPerHour / 100) * dt;
  const emin = (b.energyKwh * b.socMinPct) / 100;
  const emax = (b.energyKwh * b.socMaxPct) / 100;
  const e0 = tweaks.initialEnergyKwh ?? p.initialEnergyKwh;
  const obj: { name: string; coef: number }[] = [];
  const rows: Row[] = [];
  const bounds: { name: string; type: number; lb: number; ub: number }[] = [];
  const box = (name: string, lb: number, ub: number | null): void => {
    bounds.push(
      ub === null ? { name, type: glpk.GLP_LO, lb, ub: 0 } : { name, type: lb === ub ? glpk.GLP_FX : glpk.GLP_DB, lb, ub },
    );
  };
  for (let t = 0; t < n; t++) {
    box(`c${t}`, 0, b.powerChargeKw);
    box(`d${t}`, 0, b.powerDischargeKw);
    box(`m${t}`, 0, p.site.importLimitKw);
    box(`x${t}`, 0, p.site.exportLimitKw);
    const fixed = tweaks.fixSocKwh?.[t];
    if (fixed === undefined) box(`e${t + 1}`, emin, emax);
    else box(`e${t + 1}`, fixed, fixed);
    obj.push({ name: `m${t}`, coef: ((p.priceImport[t] ?? 0) * dt) / 1000 });
    obj.push({ name: `x${t}`, coef: (-(p.priceExport[t] ?? 0) * dt) / 1000 });
    obj.push({ name: `d${t}`, coef: (b.degradationCostPerMwh * dt) / 1000 });
    // e_{t+1} − a·e_t − η_ch·Δt·c_t + Δt/η_dis·d_t = (t = 0 ? a·e_0 : 0) (+ injected energy)
    const rhs = (t === 0 ? a * e0 : 0) + (tweaks.inject?.step === t ? tweaks.inject.deltaKwh : 0);
    const vars = [
      { name: `e${t + 1}`, coef: 1 },
      { name: `c${t}`, coef: -b.efficiencyCharge * dt },
      { name: `d${t}`, coef: dt / b.efficiencyDischarge },
    ];
    if (t > 0) vars.push({ name: `e${t}`, coef: -a });
    rows.push({ name: `soc${t}`, vars, bnds: { type: glpk.GLP_FX, lb: rhs, ub: rhs } });
    // m − x − c + d = L − G (site balance)
    const net = (p.loadKw[t] ?? 0) - (p.generationKw[t] ?? 0);
    rows.push({
      name: `bal${t}`,
      vars: [
        { name: `m${t}`, coef: 1 },
        { name: `x${t}`, coef: -1 },
        { name: `c${t}`, coef: -1 },
        { name: `d${t}`, coef: 1 },
      ],
      bnds: { type: glpk.GLP_FX, lb: net, ub: net },
    });
  }
  const rule = p.terminal;
  const last = { name: `e${n}`, coef: 1 };
  const e0End = p.initialEnergyKwh;
  if (rule.kind === 'cyclic') rows.push({ name: 'end', vars: [last], bnds: { type: glpk.GLP_FX, lb: e0End, ub: e0End } });
  if (rule.kind === 'target') {
    const target = (b.energyKwh * rule.socPct) / 100;
    rows.push({ name: 'end', vars: [last], bnds: { type: glpk.GLP_LO, lb: target, ub: 0 } });
  }
  if (rule.kind === 'steady-value') obj.push({ name: `e${n}`, coef: -rule.valuePerMwh / 1000 });
  const res = glpk.solve(
    { name: 'dispatch', objective: { direction: glpk.GLP_MIN, name: 'cost', vars: obj }, subjectTo: rows, bounds },
    { msglev: glpk.GLP_MSG_OFF, presol: false },
  );
  const st = res.result.status;
  if (st === glpk.GLP_NOFEAS || st === glpk.GLP_INFEAS) return { status: 'infeasible', objective: NaN, socKwh: [] };
  if (st !== glpk.GLP_OPT) return { status: 'other', objective: NaN, socKwh: [] };
  const socKwh = [e0];
  for (let t = 1; t <= n; t++) socKwh.push(res.result.vars[`e${t}`] ?? NaN);
  return { status: 'optimal', objective: res.result.z, socKwh };
}
