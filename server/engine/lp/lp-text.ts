/**
 * CPLEX LP text of an LpModel: the input format of HiGHS's one-shot `solve`. The
 * engine itself passes arrays; the text is for the benchmark's direct HiGHS
 * baseline and for looking at a model by eye.
 */
import type { LpModel } from './lp-model';

function term(coef: number, name: string, first: boolean): string {
  const sign = coef < 0 ? '-' : first ? '' : '+';
  return `${sign} ${Math.abs(coef)} ${name}`.trim();
}

function names(model: LpModel) {
  return {
    col: (j: number) => model.colNames?.[j] ?? `x${j}`,
    row: (i: number) => model.rowNames?.[i] ?? `r${i}`,
  };
}

function rowText(model: LpModel, i: number, col: (j: number) => string): string {
  const parts: string[] = [];
  for (let k = model.rowStarts[i]!; k < model.rowStarts[i + 1]!; k++) {
    parts.push(term(model.values[k]!, col(model.colIndex[k]!), parts.length === 0));
  }
  return parts.length > 0 ? parts.join(' ') : `0 ${col(0)}`;
}

export function writeLpText(model: LpModel): string {
  const { col, row } = names(model);
  const objective: string[] = [];
  for (let j = 0; j < model.numCols; j++) {
    if (model.colCost[j] !== 0) objective.push(term(model.colCost[j]!, col(j), objective.length === 0));
  }
  if (model.offset !== 0) objective.push(`${model.offset < 0 ? '-' : '+'} ${Math.abs(model.offset)}`);
  const lines = ['Minimize', ` cost: ${objective.join(' ') || `0 ${col(0)}`}`, 'Subject To'];
  for (let i = 0; i < model.numRows; i++) {
    const lhs = rowText(model, i, col);
    const lo = model.rowLower[i]!;
    const hi = model.rowUpper[i]!;
    if (lo === hi) lines.push(` ${row(i)}: ${lhs} = ${lo}`);
    else {
      if (Number.isFinite(lo)) lines.push(` ${row(i)}_lo: ${lhs} >= ${lo}`);
      if (Number.isFinite(hi)) lines.push(` ${row(i)}_hi: ${lhs} <= ${hi}`);
    }
  }
  lines.push('Bounds');
  for (let j = 0; j < model.numCols; j++) {
    const lo = model.colLower[j]!;
    const hi = model.colUpper[j]!;
    if (lo === hi) lines.push(` ${col(j)} = ${lo}`);
    else if (!Number.isFinite(lo) && !Number.isFinite(hi)) lines.push(` ${col(j)} free`);
    else lines.push(` ${Number.isFinite(lo) ? lo : '-inf'} <= ${col(j)} <= ${Number.isFinite(hi) ? hi : '+inf'}`);
  }
  lines.push('End', '');
  return lines.join('\n');
}
