/**
 * Recommendation of a horizon study: the shortest horizon whose closed-loop
 * net cost (stored energy valued, DESIGN section 3.1) is within the target
 * (default 0.5 %) of the battery's value on the reference path, and whose
 * open-loop plans never let the leaving arc reach into the steps they commit.
 * Among runs of that horizon, the smaller net cost wins. When no run meets the
 * target, the box says so plainly and names the run with the smallest gap.
 */
import { money } from '../value/net-figures';

export const DEFAULT_GAP_TARGET_PCT = 0.5;

export interface RunFigures {
  readonly horizonHours: number;
  readonly terminal: string;
  readonly gapPct: number;
  /** Run net cost − reference net cost, currency. */
  readonly gapValue: number;
  /** 100·gapValue / |reference battery value|. */
  readonly valueGapPct: number;
  readonly leavingIntoCommitted: number;
  readonly solves: number;
}

export interface Recommendation {
  readonly horizonHours: number | null;
  readonly terminal: string | null;
  readonly reason: string;
  /** Whether the recommended run met the target (false: the best there is, with the reason why not). */
  readonly metTarget: boolean;
}

const pct = (v: number) => `${v.toFixed(3)} %`;

function gapWords(run: RunFigures, currency?: string): string {
  return `gap ${money(run.gapValue, currency)}, ${pct(run.valueGapPct)} of the battery's value`;
}

export function recommendHorizon(
  runs: readonly RunFigures[],
  targetPct = DEFAULT_GAP_TARGET_PCT,
  currency?: string,
): Recommendation {
  const usable = runs.filter((r) => Number.isFinite(r.valueGapPct) && Number.isFinite(r.gapValue));
  if (usable.length === 0)
    return { horizonHours: null, terminal: null, reason: 'no run finished, so there is nothing to recommend', metTarget: false };
  const byHorizonThenGap = [...usable].sort((a, b) => a.horizonHours - b.horizonHours || a.gapValue - b.gapValue);
  const good = byHorizonThenGap.find((r) => r.valueGapPct <= targetPct && r.leavingIntoCommitted === 0);
  if (good) {
    return {
      horizonHours: good.horizonHours,
      terminal: good.terminal,
      reason: `the shortest horizon whose closed-loop net cost is within ${pct(targetPct)} of the battery's value on the reference path (${gapWords(good, currency)}) and whose plans never let the leaving arc reach the committed steps`,
      metTarget: true,
    };
  }
  const best = [...usable].sort((a, b) => a.gapValue - b.gapValue || a.horizonHours - b.horizonHours)[0]!;
  const leaving =
    best.leavingIntoCommitted > 0
      ? `; in ${best.leavingIntoCommitted} of ${best.solves} plans the leaving arc reached the committed steps`
      : '';
  return {
    horizonHours: best.horizonHours,
    terminal: best.terminal,
    reason: `no run met the target of ${pct(targetPct)} of the battery's value with leaving arcs clear of the committed steps; this run has the smallest gap (${gapWords(best, currency)})${leaving}: consider longer horizons`,
    metTarget: false,
  };
}
