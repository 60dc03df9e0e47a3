/**
 * A plan's profiles on the engine's grid, and its steady cycle, kept inside the
 * preview thread for the next slider move. A plan's snapshot never changes for
 * one input version and its profiles are named by SHA-256, so an entry never
 * goes stale; it only takes memory, hence a small least-recently-used cache.
 * Aligning a year of profiles and solving the steady cycle take far longer than
 * the exact re-plan itself (tenths of a second against milliseconds). Pure: no database.
 */
import type { PlanInputs } from '@shared/schemas/plan';
import type { SteadyDays } from '@shared/schemas/steady-days';
import { solveSteadyCycle, type AlignedInputs, type SteadyCycle } from '../engine';
import { unprocessable } from '../http/app-error';
import { alignSnapshot } from '../runs/align-snapshot';
import type { SnapshotSeries } from '../runs/profile-series';

export interface PreviewSource {
  readonly aligned: AlignedInputs;
  /** Solved on first use (a model the preview refuses never needs it). */
  steady: SteadyCycle | null;
}

/** Entries kept: a year of 5-minute steps is a few MB. */
export const MAX_CACHED_PLANS = 8;

export class PreviewCache {
  private readonly entries = new Map<string, PreviewSource>();

  constructor(private readonly maxEntries = MAX_CACHED_PLANS) {}

  /** The cached source, now the most recently used; undefined when the thread has not seen this snapshot. */
  get(key: string): PreviewSource | undefined {
    const entry = this.entries.get(key);
    if (entry) {
      this.entries.delete(key);
      this.entries.set(key, entry);
    }
    return entry;
  }

  /** Aligns the snapshot's profiles and keeps them; a snapshot that cannot be aligned is refused and not kept. */
  add(key: string, inputs: Pick<PlanInputs, 'battery' | 'site'>, series: SnapshotSeries): PreviewSource {
    const aligned = alignSnapshot(inputs, series);
    if (!aligned.ok) throw unprocessable(`The plan’s inputs cannot be put on one time grid: ${aligned.issue.message}.`);
    const entry: PreviewSource = { aligned: aligned.inputs, steady: null };
    this.entries.set(key, entry);
    while (this.entries.size > this.maxEntries) this.entries.delete(this.entries.keys().next().value!);
    return entry;
  }

  get size(): number {
    return this.entries.size;
  }
}

/** The steady cycle of the plan's whole data period over the plan's days, as the plan job solves it. */
export function steadyOf(source: PreviewSource, days: SteadyDays = 'all'): SteadyCycle {
  if (!source.steady) {
    const result = solveSteadyCycle(source.aligned, { days });
    if (!result.ok) throw unprocessable(`The steady cycle cannot be solved for this plan: ${result.issue.message}.`);
    source.steady = result.cycle;
  }
  return source.steady;
}
