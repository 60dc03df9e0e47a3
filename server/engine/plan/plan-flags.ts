/**
 * Flags a planner can act on, in plain words, from a plan's turnpike figures and
 * schedule. Warnings on the battery's settings come from the one shared rule set
 * (shared/schemas/battery-warnings.ts).
 */
import type { DispatchSolution } from '../types';
import type { PlanTurnpike } from './plan-turnpike';

export interface FlagContext {
  readonly stepMinutes: number;
  readonly deliverySteps: number;
  readonly windowSteps: number;
  readonly requestedHorizonHours: number;
  readonly terminalKind: string;
  readonly timeOfStep: (t: number) => string;
  /** Why no longer plan exists, when it does not. */
  readonly longerMissing?: string;
  readonly longerHours: number | null;
}

const hours = (steps: number, stepMinutes: number) => `${+((steps * stepMinutes) / 60).toFixed(2)} h`;

export function planFlags(tp: PlanTurnpike, plan: DispatchSolution, ctx: FlagContext): string[] {
  const flags: string[] = [];
  const lookedHours = (ctx.windowSteps * ctx.stepMinutes) / 60;
  if (lookedHours < ctx.requestedHorizonHours - 1e-9) {
    flags.push(
      `The price data end at ${ctx.timeOfStep(ctx.windowSteps)}, so the plan looks only ${hours(ctx.windowSteps, ctx.stepMinutes)} ahead instead of ${ctx.requestedHorizonHours} h.`,
    );
  }
  const leavingStart = ctx.windowSteps - tp.leavingArcSteps;
  if (tp.leavingArcSteps > 0 && leavingStart < ctx.deliverySteps) {
    const fix =
      ctx.terminalKind === 'steady-value' ? 'lengthen the horizon' : 'lengthen the horizon or use the steady-value terminal rule';
    flags.push(
      `The leaving arc reaches into the delivery window: from ${ctx.timeOfStep(leavingStart)} the plan moves away from the steady cycle because it sees nothing beyond its horizon; ${fix}.`,
    );
  }
  if (tp.commitWindowSteps === null) {
    flags.push(`The commit window could not be checked: ${ctx.longerMissing ?? 'no longer plan was available'}.`);
  } else if (tp.commitWindowSteps < ctx.deliverySteps) {
    flags.push(
      `Only the first ${hours(tp.commitWindowSteps, ctx.stepMinutes)} of the delivery window agree with a plan looking ${ctx.longerHours} h ahead: commit up to ${ctx.timeOfStep(tp.commitWindowSteps)} and re-plan before then, or lengthen the horizon.`,
    );
  }
  if (tp.nearSteadyShare < 0.5) {
    flags.push(
      `The plan is near the steady cycle in only ${Math.round(tp.nearSteadyShare * 100)} % of its steps: prices in this window differ from the representative day, so treat the steady cycle as a rough guide here.`,
    );
  }
  const simultaneous = plan.simultaneousSteps ?? [];
  if (simultaneous.length > 0) {
    flags.push(
      `The schedule charges and discharges at once in ${simultaneous.length} interval(s), first at ${ctx.timeOfStep(simultaneous[0]!)}: this only pays at negative prices; check that the site controller allows it.`,
    );
  }
  return flags;
}
