/**
 * Turnpike figures of a plan against a reference trajectory (the steady cycle
 * repeated by time of day, or a reference path / longer plan over the same steps).
 * Words and definitions as in docs/model.md: distance per step, band, near-steady share, entry
 * arc (steps before first entering the band), leaving arc (steps after last
 * leaving it), commit window (leading steps within the band of a longer plan).
 * [S] Trélat & Zuazua 2015; Faulwasser & Grüne 2020 (entry arc, middle arc near
 * the turnpike, leaving arc); Zanon, Grüne & Diehl 2017 (periodic turnpike).
 */

/** Default band: 5 % of usable energy for SoC (docs/model.md). */
export const DEFAULT_BAND_FRACTION = 0.05;

export interface ArcFigures {
  /** |plan − reference| / scale per step (for SoC: fraction of usable energy). */
  readonly distance: readonly number[];
  /** The band in the same units as distance. */
  readonly band: number;
  readonly nearSteadyShare: number;
  readonly stepsOutsideBand: number;
  /** Steps before the plan first comes within the band (all steps if it never does). */
  readonly entryArcSteps: number;
  /** Steps after the plan last leaves the band (0 if it never is inside). */
  readonly leavingArcSteps: number;
}

/**
 * Arc figures of `plan` against `reference` (same length), distances divided by
 * `scale`, band given as a fraction of `scale`. NaN reference entries (unknown,
 * e.g. degenerate duals) count as inside the band.
 */
export function arcFigures(
  plan: ArrayLike<number>,
  reference: ArrayLike<number>,
  scale: number,
  bandFraction = DEFAULT_BAND_FRACTION,
): ArcFigures {
  const n = plan.length;
  const distance: number[] = [];
  let inside = 0;
  let first = -1;
  let last = -1;
  for (let t = 0; t < n; t++) {
    const ref = reference[t]!;
    const dist = Number.isNaN(ref) ? 0 : Math.abs(plan[t]! - ref) / scale;
    distance.push(dist);
    if (dist <= bandFraction + 1e-12) {
      inside++;
      if (first < 0) first = t;
      last = t;
    }
  }
  return {
    distance,
    band: bandFraction,
    nearSteadyShare: n === 0 ? 0 : inside / n,
    stepsOutsideBand: n - inside,
    entryArcSteps: first < 0 ? n : first,
    leavingArcSteps: last < 0 ? 0 : n - 1 - last,
  };
}

/** Leading steps where |plan − longer| / scale stays within the band. */
export function commitWindowSteps(
  plan: ArrayLike<number>,
  longer: ArrayLike<number>,
  scale: number,
  bandFraction = DEFAULT_BAND_FRACTION,
): number {
  const n = Math.min(plan.length, longer.length);
  for (let t = 0; t < n; t++) {
    if (Math.abs(plan[t]! - longer[t]!) / scale > bandFraction + 1e-12) return t;
  }
  return n;
}

/** One stretch of steps outside the band between the entry arc and the leaving arc. */
export interface ExcursionStretch {
  /** First step of the stretch (index into the plan's steps). */
  readonly start: number;
  readonly steps: number;
  /** Largest distance in the stretch, in the units of `distance`. */
  readonly largestDistance: number;
}

/** Excursions (DESIGN section 2): stretches outside the band between the entry arc and the leaving arc. */
export interface Excursions {
  readonly count: number;
  /** Steps outside the band in all of them. */
  readonly steps: number;
  /** The largest distance in any of them (0 when there is none), in the units of `distance`. */
  readonly largestDistance: number;
  readonly stretches: readonly ExcursionStretch[];
}

/**
 * Excursions of arc figures: between the first and the last step inside the
 * band, every maximal run of steps outside it. Together with the entry and
 * leaving arcs they account for every step outside the band.
 */
export function excursionFigures(fig: ArcFigures): Excursions {
  const n = fig.distance.length;
  const stretches: ExcursionStretch[] = [];
  const last = n - 1 - fig.leavingArcSteps;
  let current: { start: number; steps: number; largestDistance: number } | null = null;
  for (let t = fig.entryArcSteps; t <= last; t++) {
    const d = fig.distance[t]!;
    if (d <= fig.band + 1e-12) {
      if (current) stretches.push(current);
      current = null;
    } else if (current) {
      current.steps++;
      current.largestDistance = Math.max(current.largestDistance, d);
    } else {
      current = { start: t, steps: 1, largestDistance: d };
    }
  }
  if (current) stretches.push(current);
  return {
    count: stretches.length,
    steps: stretches.reduce((sum, s) => sum + s.steps, 0),
    largestDistance: stretches.reduce((max, s) => Math.max(max, s.largestDistance), 0),
    stretches,
  };
}
