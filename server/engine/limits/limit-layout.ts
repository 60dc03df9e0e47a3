/**
 * Where the operating limits of DESIGN section 3.3 sit inside a step's block of
 * the dispatch LP. They are extra columns and rows of every step (never
 * model-wide), so per-step blocks keep one shape and a basis still rotates by
 * whole steps between receding-horizon windows.
 *
 * Columns: r↑_t, r↓_t (reserve held, kW) when the model has reserve prices;
 * s⁺_t, s⁻_t (rise and fall of net power from the step before, kW) with a ramp
 * rate or a switching cost. Rows: power headroom (2), energy headroom at the end
 * and the start of the step (4), grid headroom where a limit exists (0–2), and
 * the move row tying s⁺ − s⁻ to the change of net power.
 */
import type { DispatchProblem } from '../types';
import { hasMoves, hasReserves, limitFeatures } from './limit-features';

export interface LimitLayout {
  /** Columns and rows added to each step. */
  readonly cols: number;
  readonly rows: number;
  /** Column offsets in a step's block (-1 when absent). */
  readonly reserveUp: number;
  readonly reserveDown: number;
  readonly moveUp: number;
  readonly moveDown: number;
  /** Row offsets in a step's block (-1 when absent). */
  readonly powerUpRow: number;
  readonly powerDownRow: number;
  readonly energyUpEndRow: number;
  readonly energyDownEndRow: number;
  readonly energyUpStartRow: number;
  readonly energyDownStartRow: number;
  readonly gridUpRow: number;
  readonly gridDownRow: number;
  readonly moveRow: number;
}

/**
 * @param firstCol offset of the first limit column (after c, d and the grid columns)
 * @param firstRow offset of the first limit row (after the SoC, balance and peak rows)
 */
export function limitLayout(problem: DispatchProblem, firstCol: number, firstRow: number, hasGrid: boolean): LimitLayout {
  const f = limitFeatures(problem);
  let col = firstCol;
  let row = firstRow;
  const reserves = hasReserves(f);
  const moves = hasMoves(f);
  const nextCol = (on: boolean) => (on ? col++ : -1);
  const nextRow = (on: boolean) => (on ? row++ : -1);
  const reserveUp = nextCol(reserves);
  const reserveDown = nextCol(reserves);
  const moveUp = nextCol(moves);
  const moveDown = nextCol(moves);
  const powerUpRow = nextRow(reserves);
  const powerDownRow = nextRow(reserves);
  const energyUpEndRow = nextRow(reserves);
  const energyDownEndRow = nextRow(reserves);
  const energyUpStartRow = nextRow(reserves);
  const energyDownStartRow = nextRow(reserves);
  // Upward reserve may raise the export, downward the import: only a limited side needs a row.
  const gridUpRow = nextRow(reserves && hasGrid && problem.site.exportLimitKw !== null);
  const gridDownRow = nextRow(reserves && hasGrid && problem.site.importLimitKw !== null);
  const moveRow = nextRow(moves);
  return {
    cols: col - firstCol,
    rows: row - firstRow,
    reserveUp,
    reserveDown,
    moveUp,
    moveDown,
    powerUpRow,
    powerDownRow,
    energyUpEndRow,
    energyDownEndRow,
    energyUpStartRow,
    energyDownStartRow,
    gridUpRow,
    gridDownRow,
    moveRow,
  };
}

/** Whether two limit layouts put the same rows in the same places (the matrix can then be shared). */
export function sameLimitLayout(a: LimitLayout, b: LimitLayout): boolean {
  return (
    a.cols === b.cols &&
    a.rows === b.rows &&
    a.reserveUp === b.reserveUp &&
    a.moveUp === b.moveUp &&
    a.gridUpRow === b.gridUpRow &&
    a.gridDownRow === b.gridDownRow &&
    a.moveRow === b.moveRow
  );
}
