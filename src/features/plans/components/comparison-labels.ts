/** How the comparison names its plans, in the table and on the chart. */
import type { Plan } from '@shared/schemas/plan';
import { steadyDaysLabels } from '@shared/schemas/steady-days';

/** The rule, and the steady-cycle days when not every day (they change the steady-value end and the figures). */
export function ruleLabel(plan: Plan): string {
  const days = plan.inputs?.steadyDays ?? 'all';
  return days === 'all' ? plan.terminalRule : `${plan.terminalRule} · ${steadyDaysLabels[days]}`;
}

/**
 * "24 h, free" per plan; a second plan with the same horizon and rule (another initial SoC, say)
 * becomes "24 h, free (2)", so chart series and legend entries stay apart.
 */
export function planLabels(plans: readonly Plan[]): string[] {
  const seen = new Map<string, number>();
  return plans.map((p) => {
    const base = `${p.horizonHours} h, ${ruleLabel(p)}`;
    const count = (seen.get(base) ?? 0) + 1;
    seen.set(base, count);
    return count === 1 ? base : `${base} (${count})`;
  });
}
