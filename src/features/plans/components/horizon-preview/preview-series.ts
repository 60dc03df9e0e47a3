/** The plan's SoC and the preview's on one time axis: SoC at the end of each step, delivery and lookahead apart. */
import type { HorizonPreview } from '@shared/schemas/horizon-preview';
import type { PlanResults } from '@shared/schemas/plan';

export interface SocPoint {
  /** End of the step, epoch ms. */
  tEnd: number;
  socPct: number;
  delivery: boolean;
}

export interface SocLine {
  delivery: SocPoint[];
  /** Starts with the last delivery point so the two parts join. */
  lookahead: SocPoint[];
}

export interface SocRow {
  tEnd: number;
  delivery: boolean;
  plan: number | null;
  preview: number | null;
}

function line(steps: readonly { time: string; socPct: number; delivery: boolean }[], stepMinutes: number): SocLine {
  const points = steps.map((s) => ({ tEnd: Date.parse(s.time) + stepMinutes * 60_000, socPct: s.socPct, delivery: s.delivery }));
  const deliveryCount = points.filter((p) => p.delivery).length;
  return {
    delivery: points.slice(0, deliveryCount),
    lookahead: deliveryCount < points.length ? points.slice(Math.max(0, deliveryCount - 1)) : [],
  };
}

export function planSocLine(results: PlanResults): SocLine {
  return line(results.steps, results.stepMinutes);
}

export function previewSocLine(preview: HorizonPreview): SocLine {
  return line(preview.steps, preview.stepMinutes);
}

/** One row per step end of either, in time order (the text alternative to the chart). */
export function socRows(results: PlanResults, preview: HorizonPreview): SocRow[] {
  const rows = new Map<number, SocRow>();
  const add = (l: SocLine, key: 'plan' | 'preview') => {
    for (const p of [...l.delivery, ...l.lookahead]) {
      const row = rows.get(p.tEnd) ?? { tEnd: p.tEnd, delivery: p.delivery, plan: null, preview: null };
      row[key] = p.socPct;
      rows.set(p.tEnd, row);
    }
  };
  add(planSocLine(results), 'plan');
  add(previewSocLine(preview), 'preview');
  return [...rows.values()].sort((a, b) => a.tEnd - b.tEnd);
}
