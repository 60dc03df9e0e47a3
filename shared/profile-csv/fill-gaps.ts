/**
 * Linear interpolation across missing intervals, used only when the user asks
 * for gap filling. Each missing value lies on the straight
 * line between the nearest given values before and after it.
 */

/** Fills NaN entries in place; returns their indexes. Ends must hold values (the caller checks). */
export function fillGapsLinearly(values: number[]): number[] {
  const filled: number[] = [];
  let i = 0;
  while (i < values.length) {
    if (!Number.isNaN(values[i])) {
      i += 1;
      continue;
    }
    const before = i - 1;
    let after = i;
    while (after < values.length && Number.isNaN(values[after])) after += 1;
    const left = values[before];
    const right = values[after];
    if (left === undefined || right === undefined) return filled;
    const span = after - before;
    for (let k = i; k < after; k += 1) {
      values[k] = left + ((right - left) * (k - before)) / span;
      filled.push(k);
    }
    i = after;
  }
  return filled;
}

/** "3, 4, 7-9" style summary of indexes for notes, shortened past a few runs. */
export function describeIndexRuns(indexes: readonly number[], maxRuns = 5): string {
  const runs: string[] = [];
  let start = indexes[0];
  let prev = start;
  for (let j = 1; j <= indexes.length; j += 1) {
    const cur = indexes[j];
    if (start === undefined || prev === undefined) break;
    if (cur !== prev + 1) {
      runs.push(start === prev ? String(start) : `${start}-${prev}`);
      start = cur;
    }
    prev = cur;
  }
  return runs.length > maxRuns ? `${runs.slice(0, maxRuns).join(', ')} and ${runs.length - maxRuns} more runs` : runs.join(', ');
}
