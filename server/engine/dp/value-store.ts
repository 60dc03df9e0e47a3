/**
 * Slots of convex piecewise-linear value functions V(e) on [lo, hi] (kWh),
 * kept as segment lengths (kWh) and slopes (currency/kWh, ascending), plus the
 * value at lo (currency). Each slot has room for `cap` segments; the store
 * doubles `cap` when a function outgrows it, so callers re-read the arrays
 * after `ensureCapacity`. Typed arrays keep the inner loops allocation-free.
 */
export class ValueStore {
  cap: number;
  readonly slots: number;
  readonly lo: Float64Array;
  readonly hi: Float64Array;
  readonly vlo: Float64Array;
  readonly count: Int32Array;
  len: Float64Array;
  slope: Float64Array;

  constructor(slots: number, cap = 8) {
    this.slots = slots;
    this.cap = cap;
    this.lo = new Float64Array(slots);
    this.hi = new Float64Array(slots);
    this.vlo = new Float64Array(slots);
    this.count = new Int32Array(slots);
    this.len = new Float64Array(slots * cap);
    this.slope = new Float64Array(slots * cap);
  }

  /** Makes room for `need` segments in every slot. */
  ensureCapacity(need: number): void {
    if (need <= this.cap) return;
    let cap = this.cap * 2;
    while (cap < need) cap *= 2;
    const len = new Float64Array(this.slots * cap);
    const slope = new Float64Array(this.slots * cap);
    for (let s = 0; s < this.slots; s++) {
      const n = this.count[s] ?? 0;
      len.set(this.len.subarray(s * this.cap, s * this.cap + n), s * cap);
      slope.set(this.slope.subarray(s * this.cap, s * this.cap + n), s * cap);
    }
    this.cap = cap;
    this.len = len;
    this.slope = slope;
  }

  /** True when two slots hold the same shape bit for bit (value offsets may differ). */
  sameShape(a: number, b: number): boolean {
    return shapesEqual(this, a, this, b);
  }

  /** Copies slot `from` into slot `to`. */
  copy(from: number, to: number): void {
    const n = this.count[from] ?? 0;
    this.lo[to] = this.lo[from] ?? 0;
    this.hi[to] = this.hi[from] ?? 0;
    this.vlo[to] = this.vlo[from] ?? 0;
    this.count[to] = n;
    this.len.copyWithin(to * this.cap, from * this.cap, from * this.cap + n);
    this.slope.copyWithin(to * this.cap, from * this.cap, from * this.cap + n);
  }

  /** The breakpoints (kWh) and slopes (currency/kWh) of one slot as plain arrays. */
  read(slot: number): { lo: number; hi: number; breakpoints: number[]; slopes: number[] } {
    const n = this.count[slot] ?? 0;
    const o = slot * this.cap;
    const lo = this.lo[slot] ?? 0;
    const hi = this.hi[slot] ?? 0;
    const breakpoints = [lo];
    const slopes: number[] = [];
    let p = lo;
    for (let i = 0; i < n; i++) {
      p = i === n - 1 ? hi : p + (this.len[o + i] ?? 0);
      breakpoints.push(p);
      slopes.push(this.slope[o + i] ?? 0);
    }
    return { lo, hi, breakpoints, slopes };
  }
}

/** Equality that also tells 0 from -0, so "same" means bit-identical results downstream. */
export function sameBits(a: number, b: number): boolean {
  return a === b && (a !== 0 || 1 / a === 1 / b);
}

/** True when slot a of store sa and slot b of store sb hold the same shape bit for bit. */
export function shapesEqual(sa: ValueStore, a: number, sb: ValueStore, b: number): boolean {
  const n = sa.count[a] ?? 0;
  if (n !== sb.count[b] || !sameBits(sa.lo[a] ?? 0, sb.lo[b] ?? 0) || !sameBits(sa.hi[a] ?? 0, sb.hi[b] ?? 0)) return false;
  const la = sa.len;
  const lb = sb.len;
  const ka = sa.slope;
  const kb = sb.slope;
  const oa = a * sa.cap;
  const ob = b * sb.cap;
  for (let i = 0; i < n; i++) {
    if (!sameBits(la[oa + i] ?? 0, lb[ob + i] ?? 0) || !sameBits(ka[oa + i] ?? 0, kb[ob + i] ?? 0)) return false;
  }
  return true;
}
