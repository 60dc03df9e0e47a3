/**
 * The tests' one seeded random generator (mulberry32, a small public-domain
 * 32-bit generator): every random case is a function of its seed, so a failure
 * names the seed and replays exactly.
 */
export function seededRandom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let x = s;
    x = Math.imul(x ^ (x >>> 15), x | 1);
    x ^= x + Math.imul(x ^ (x >>> 7), x | 61);
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * A 32-bit xorshift generator (Marsaglia, "Xorshift RNGs", J. Stat. Softw. 8(14), 2003): the
 * stream the steady-value, net-figure and operating-limit checks were drawn from, kept so
 * their random instances stay the ones they were validated on.
 */
export function xorshiftRandom(seed: number): () => number {
  let x = (seed * 2654435761) >>> 0 || 1;
  return () => {
    x ^= x << 13;
    x >>>= 0;
    x ^= x >>> 17;
    x ^= x << 5;
    x >>>= 0;
    return x / 4294967296;
  };
}
