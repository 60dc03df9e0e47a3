/**
 * Thins a long regular series for drawing: per bucket of consecutive steps keep
 * the lowest and the highest value (in time order), so spikes such as negative
 * price hours survive where averaging would hide them. A year of 5-minute data
 * (105 120 points) becomes about 2 × maxBuckets points.
 */
export interface SeriesPoint {
  /** Start of the interval, UTC epoch ms. */
  t: number;
  v: number;
}

export function downsampleMinMax(startMs: number, stepMs: number, values: readonly number[], maxBuckets = 800): SeriesPoint[] {
  const n = values.length;
  if (n <= 2 * maxBuckets) return values.map((v, i) => ({ t: startMs + i * stepMs, v }));
  const size = Math.ceil(n / maxBuckets);
  const out: SeriesPoint[] = [];
  for (let first = 0; first < n; first += size) {
    const last = Math.min(n, first + size);
    let lo = first;
    let hi = first;
    for (let i = first + 1; i < last; i += 1) {
      if ((values[i] ?? 0) < (values[lo] ?? 0)) lo = i;
      if ((values[i] ?? 0) > (values[hi] ?? 0)) hi = i;
    }
    for (const i of lo === hi ? [lo] : [Math.min(lo, hi), Math.max(lo, hi)])
      out.push({ t: startMs + i * stepMs, v: values[i] ?? 0 });
  }
  return out;
}
