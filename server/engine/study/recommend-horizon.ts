/**
 * Recommendation of a horizon study: the shortest horizon whose closed-loop gap
 * to the reference path is at most the target (default 0.5 %) and whose
 * open-loop plans never let the leaving arc reach into the steps they commit.
 * Among runs of that horizon, the smaller gap wins.
 */
export const DEFAULT_GAP_TARGET_PCT = 0.5;

export interface RunFigures {
  readonly horizonHours: number;
  readonly terminal: string;
  readonly gapPct: number;
  readonly leavingIntoCommitted: number;
  readonly solves: number;
}

export interface Recommendation {
  readonly horizonHours: number | null;
  readonly terminal: string | null;
  readonly reason: string;
}

const pct = (v: number) => `${v.toFixed(3)} %`;

export function recommendHorizon(runs: readonly RunFigures[], targetPct = DEFAULT_GAP_TARGET_PCT): Recommendation {
  const usable = runs.filter((r) => Number.isFinite(r.gapPct));
  if (usable.length === 0)
    return { horizonHours: null, terminal: null, reason: 'no run finished, so there is nothing to recommend' };
  const byHorizonThenGap = [...usable].sort((a, b) => a.horizonHours - b.horizonHours || a.gapPct - b.gapPct);
  const good = byHorizonThenGap.find((r) => r.gapPct <= targetPct && r.leavingIntoCommitted === 0);
  if (good) {
    return {
      horizonHours: good.horizonHours,
      terminal: good.terminal,
      reason: `the shortest horizon whose closed-loop cost is within ${pct(targetPct)} of the reference path (gap ${pct(good.gapPct)}) and whose plans never let the leaving arc reach the committed steps`,
    };
  }
  const best = [...usable].sort((a, b) => a.gapPct - b.gapPct || a.horizonHours - b.horizonHours)[0]!;
  const leaving =
    best.leavingIntoCommitted > 0
      ? `; in ${best.leavingIntoCommitted} of ${best.solves} plans the leaving arc reached the committed steps`
      : '';
  return {
    horizonHours: best.horizonHours,
    terminal: best.terminal,
    reason: `no run met the ${pct(targetPct)} target with leaving arcs clear of the committed steps; this run has the smallest gap (${pct(best.gapPct)})${leaving}: consider longer horizons`,
  };
}
