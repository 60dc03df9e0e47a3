/**
 * The SoC a plan starts from when the request names none: the end SoC of the
 * battery's last approved plan that ends by the delivery start (the schedule
 * the site is expected to follow), else the battery's own initial SoC.
 */
import type { BatterySnapshot, InitialSocSource } from '@shared/schemas/plan';
import type { DbOrTx } from '../db/client';
import { unprocessable } from '../http/app-error';
import { lastApprovedEndSoc } from '../plans/plans.repo';

export interface InitialSoc {
  pct: number;
  source: InitialSocSource;
  planId: string | null;
}

const inWindow = (b: BatterySnapshot, pct: number) => pct >= b.socMinPct - 1e-9 && pct <= b.socMaxPct + 1e-9;

export async function resolveInitialSoc(
  db: DbOrTx,
  battery: BatterySnapshot,
  requested: number | null | undefined,
  start: Date,
): Promise<InitialSoc> {
  if (requested !== null && requested !== undefined) {
    if (!inWindow(battery, requested)) {
      throw unprocessable('The initial SoC is outside the battery’s SoC window.', [
        {
          path: 'initialSocPct',
          message: `The initial SoC of ${requested} % lies outside the SoC window of "${battery.name}" (${battery.socMinPct}–${battery.socMaxPct} %). Enter a value inside it, or leave it empty to use the last approved plan's end SoC.`,
        },
      ]);
    }
    return { pct: requested, source: 'request', planId: null };
  }
  const last = await lastApprovedEndSoc(db, battery.id, start);
  // An approved plan from before a battery edit may end outside today's window: then it cannot be the start.
  if (last && last.endSocPct !== null && inWindow(battery, last.endSocPct)) {
    return { pct: last.endSocPct, source: 'last-approved-plan', planId: last.id };
  }
  return { pct: battery.socInitialPct, source: 'battery', planId: null };
}

/** A target terminal rule the battery cannot reach is refused before any job runs. */
export function checkTerminalTarget(battery: BatterySnapshot, targetPct: number | null, field: string, index?: number) {
  if (targetPct === null || targetPct <= battery.socMaxPct + 1e-9) return;
  throw unprocessable('The terminal target is above the battery’s maximum SoC.', [
    {
      path: index === undefined ? field : `${field}.${index}`,
      message: `target:${targetPct} asks for ${targetPct} % at the end, above the maximum SoC of "${battery.name}" (${battery.socMaxPct} %). Choose a target of at most ${battery.socMaxPct} %.`,
    },
  ]);
}
