/**
 * Which operating limits of DESIGN section 3.3 a dispatch problem uses, and the
 * reason it must go to the LP path when it does. Availability alone only changes
 * per-step power bounds, so the exact dynamic program still takes it; reserves,
 * a ramp rate and a switching cost couple variables the DP does not carry (the
 * reserve beside the SoC, the previous step's power), so they need the LP.
 */
import type { DispatchProblem } from '../types';

export interface LimitFeatures {
  readonly upReserve: boolean;
  readonly downReserve: boolean;
  /** Ramp rate in kW per minute, or null. */
  readonly rampKwPerMin: number | null;
  /** Switching cost in currency per MW, or null (0 counts as none). */
  readonly switchingCostPerMw: number | null;
  readonly availability: boolean;
}

export function limitFeatures(problem: DispatchProblem): LimitFeatures {
  const ramp = problem.battery.rampKwPerMin ?? null;
  const switching = problem.battery.switchingCostPerMw ?? null;
  return {
    upReserve: problem.reserveUpPrice !== undefined,
    downReserve: problem.reserveDownPrice !== undefined,
    rampKwPerMin: ramp,
    switchingCostPerMw: switching !== null && switching !== 0 ? switching : null,
    availability: problem.availability !== undefined,
  };
}

export const hasReserves = (f: LimitFeatures) => f.upReserve || f.downReserve;
/** Whether the model needs the move columns and rows (ramp or switching cost). */
export const hasMoves = (f: LimitFeatures) => f.rampKwPerMin !== null || f.switchingCostPerMw !== null;
/** Whether any limit of section 3.3 is in the model. */
export const hasLimits = (f: LimitFeatures) => hasReserves(f) || hasMoves(f) || f.availability;

/** Why the exact DP cannot take the problem because of its operating limits, or null when they are no obstacle. */
export function lpOnlyReason(problem: DispatchProblem): string | null {
  const f = limitFeatures(problem);
  const parts: string[] = [];
  if (hasReserves(f)) parts.push('reserves are held beside the schedule');
  if (f.rampKwPerMin !== null) parts.push(`a ramp rate (${f.rampKwPerMin} kW/min) links each interval to the one before`);
  if (f.switchingCostPerMw !== null)
    parts.push(`a switching cost (${f.switchingCostPerMw} per MW) prices the change from the interval before`);
  if (parts.length === 0) return null;
  return `${parts.join(', and ')}; the dynamic program tracks only the state of charge, so the LP path solves it`;
}
