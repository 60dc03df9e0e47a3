/**
 * Fills the row-wise arrays of an LpModel when the sizes are known up front, so
 * building a model costs a few typed-array writes per non-zero (the receding-horizon
 * loop builds thousands of small models and must not be dominated by this).
 */
import type { LpModel } from './lp-model';

/**
 * With `matrixOf` set, the matrix is taken from that model and add() does nothing:
 * receding-horizon windows of one layout share their matrix, so only costs and
 * bounds are written (the caller guarantees the matrix is the same).
 */
export class CsrWriter {
  readonly colCost: Float64Array;
  readonly colLower: Float64Array;
  readonly colUpper: Float64Array;
  private readonly rowLower: Float64Array;
  private readonly rowUpper: Float64Array;
  private readonly rowStarts: Int32Array;
  private readonly colIndex: Int32Array;
  private readonly values: Float64Array;
  private row = 0;
  private nz = 0;

  constructor(
    readonly numCols: number,
    readonly numRows: number,
    maxNonZeros: number,
    private readonly matrixOf?: LpModel,
  ) {
    this.colCost = new Float64Array(numCols);
    this.colLower = new Float64Array(numCols);
    this.colUpper = new Float64Array(numCols);
    this.rowLower = new Float64Array(numRows);
    this.rowUpper = new Float64Array(numRows);
    this.rowStarts = matrixOf ? matrixOf.rowStarts : new Int32Array(numRows + 1);
    this.colIndex = matrixOf ? matrixOf.colIndex : new Int32Array(maxNonZeros);
    this.values = matrixOf ? matrixOf.values : new Float64Array(maxNonZeros);
  }

  setColumn(j: number, cost: number, lower: number, upper: number): void {
    this.colCost[j] = cost;
    this.colLower[j] = lower;
    this.colUpper[j] = upper;
  }

  /** Starts the next row; entries added until the next call belong to it. */
  startRow(lower: number, upper: number): number {
    const i = this.row++;
    this.rowLower[i] = lower;
    this.rowUpper[i] = upper;
    if (!this.matrixOf) this.rowStarts[i] = this.nz;
    return i;
  }

  add(col: number, value: number): void {
    if (this.matrixOf) return;
    this.colIndex[this.nz] = col;
    this.values[this.nz++] = value;
  }

  finish(offset: number, names?: { cols: string[]; rows: string[] }): LpModel {
    if (this.row !== this.numRows) throw new Error(`model builder wrote ${this.row} of ${this.numRows} rows`);
    const shared = this.matrixOf;
    if (!shared) this.rowStarts[this.numRows] = this.nz;
    return {
      numCols: this.numCols,
      numRows: this.numRows,
      colCost: this.colCost,
      colLower: this.colLower,
      colUpper: this.colUpper,
      rowLower: this.rowLower,
      rowUpper: this.rowUpper,
      rowStarts: this.rowStarts,
      colIndex: shared ? shared.colIndex : this.colIndex.subarray(0, this.nz),
      values: shared ? shared.values : this.values.subarray(0, this.nz),
      offset,
      ...(names ? { colNames: names.cols, rowNames: names.rows } : {}),
    };
  }
}
