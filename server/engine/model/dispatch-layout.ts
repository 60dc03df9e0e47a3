/**
 * Where each variable and row of the dispatch LP sits. Columns and rows come in
 * per-step blocks of equal shape, followed by a few model-wide ones, so a solution
 * can be read back without names and a basis can be shifted by whole steps.
 */
import type { DispatchProblem } from '../types';
import { limitLayout, sameLimitLayout, type LimitLayout } from '../limits/limit-layout';

export interface DispatchLayout {
  readonly steps: number;
  /** Whether grid import/export are variables (false: pure arbitrage at one price, folded into c and d). */
  readonly hasGrid: boolean;
  readonly colsPerStep: number;
  readonly rowsPerStep: number;
  /** Offsets inside a step's column block. */
  readonly charge: number;
  readonly discharge: number;
  readonly gridImport: number;
  readonly gridExport: number;
  /** Offset of e_{t+1} in step t's block. */
  readonly energy: number;
  /** Offsets inside a step's row block. */
  readonly socRow: number;
  readonly balanceRow: number;
  readonly peakRow: number;
  /** Columns and rows of the operating limits (reserves, ramp, switching cost); -1 offsets when absent. */
  readonly limits: LimitLayout;
  /** Model-wide columns (-1 when absent). */
  readonly initialEnergyCol: number;
  readonly peakCol: number;
  /** Daily throughput-cap rows: first row index and the day index of each. */
  readonly capRowStart: number;
  readonly capDays: readonly number[];
  /** e_N − e_0 = 0 when the start is free (-1 when absent). */
  readonly cyclicRow: number;
  readonly numCols: number;
  readonly numRows: number;
}

/** True when every step has one price for import and export and nothing limits or charges the grid. */
export function gridFoldable(problem: DispatchProblem): boolean {
  const { site, priceImport, priceExport } = problem;
  if (site.importLimitKw !== null || site.exportLimitKw !== null || site.demandChargePerKw !== null) return false;
  for (let t = 0; t < priceImport.length; t++) if (priceImport[t] !== priceExport[t]) return false;
  return true;
}

function distinctDays(dayIndex: readonly number[]): number[] {
  const days: number[] = [];
  for (const d of dayIndex) if (days.length === 0 || days[days.length - 1] !== d) days.push(d);
  return days;
}

export function dispatchLayout(problem: DispatchProblem): DispatchLayout {
  const steps = problem.priceImport.length;
  const hasGrid = !gridFoldable(problem);
  const hasPeak = problem.site.demandChargePerKw !== null;
  const baseRows = 1 + (hasGrid ? 1 : 0) + (hasPeak ? 1 : 0);
  const limits = limitLayout(problem, hasGrid ? 4 : 2, baseRows, hasGrid);
  const colsPerStep = (hasGrid ? 5 : 3) + limits.cols;
  const rowsPerStep = baseRows + limits.rows;
  let numCols = steps * colsPerStep;
  const initialEnergyCol = problem.freeInitialEnergy ? numCols++ : -1;
  const peakCol = hasPeak ? numCols++ : -1;
  const capDays = problem.battery.maxCyclesPerDay !== null ? distinctDays(problem.dayIndex) : [];
  const capRowStart = steps * rowsPerStep;
  let numRows = capRowStart + capDays.length;
  const cyclicRow = problem.freeInitialEnergy && problem.terminal.kind === 'cyclic' ? numRows++ : -1;
  return {
    steps,
    hasGrid,
    colsPerStep,
    rowsPerStep,
    charge: 0,
    discharge: 1,
    gridImport: hasGrid ? 2 : -1,
    gridExport: hasGrid ? 3 : -1,
    energy: colsPerStep - 1,
    socRow: 0,
    balanceRow: hasGrid ? 1 : -1,
    peakRow: hasPeak ? (hasGrid ? 2 : 1) : -1,
    limits,
    initialEnergyCol,
    peakCol,
    capRowStart,
    capDays,
    cyclicRow,
    numCols,
    numRows,
  };
}

const SHAPE_FIELDS = [
  'steps',
  'colsPerStep',
  'rowsPerStep',
  'initialEnergyCol',
  'peakCol',
  'cyclicRow',
  'numCols',
  'numRows',
] as const;

/**
 * Whether two problems with these layouts have the same constraint matrix: the
 * same shape, battery coefficients and step, and (with a throughput cap) local
 * days changing at the same steps. Compared field by field because it runs once
 * per receding-horizon window.
 */
export function sameMatrix(a: DispatchProblem, la: DispatchLayout, b: DispatchProblem, lb: DispatchLayout): boolean {
  for (const field of SHAPE_FIELDS) if (la[field] !== lb[field]) return false;
  const [ba, bb] = [a.battery, b.battery];
  if (a.stepHours !== b.stepHours) return false;
  if (!sameLimitLayout(la.limits, lb.limits)) return false;
  if (la.limits.reserveUp >= 0 && a.reserveHours !== b.reserveHours) return false;
  if (
    ba !== bb &&
    (ba.efficiencyCharge !== bb.efficiencyCharge ||
      ba.efficiencyDischarge !== bb.efficiencyDischarge ||
      ba.selfDischargePctPerHour !== bb.selfDischargePctPerHour)
  ) {
    return false;
  }
  if (la.capDays.length === 0) return true;
  for (let t = 1; t < la.steps; t++) {
    if ((a.dayIndex[t] !== a.dayIndex[t - 1]) !== (b.dayIndex[t] !== b.dayIndex[t - 1])) return false;
  }
  return true;
}
