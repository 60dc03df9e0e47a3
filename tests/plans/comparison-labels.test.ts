/** How the comparison page names plans of one delivery window, in its table and chart legend. */
import { describe, expect, it } from 'vitest';
import type { Plan } from '@shared/schemas/plan';
import { planLabels, ruleLabel } from '../../src/features/plans/components/comparison-labels';

const plan = (horizonHours: number, terminalRule: string, steadyDays?: 'all' | 'weekday' | 'weekend') =>
  ({ horizonHours, terminalRule, inputs: steadyDays ? { steadyDays } : undefined }) as Plan;

describe('comparison labels', () => {
  it('name the steady-cycle days only when they are not every day', () => {
    expect(ruleLabel(plan(24, 'free'))).toBe('free');
    expect(ruleLabel(plan(24, 'steady-value', 'all'))).toBe('steady-value');
    expect(ruleLabel(plan(24, 'steady-value', 'weekday'))).toBe('steady-value · weekdays (Mon–Fri)');
  });

  it('keep two plans of the same horizon and rule apart, so chart series do not merge', () => {
    const labels = planLabels([
      plan(24, 'free'),
      plan(48, 'free'),
      plan(24, 'free'),
      plan(24, 'steady-value', 'weekend'),
      plan(24, 'free'),
    ]);
    expect(labels).toEqual([
      '24 h, free',
      '48 h, free',
      '24 h, free (2)',
      '24 h, steady-value · weekend days (Sat–Sun)',
      '24 h, free (3)',
    ]);
    expect(new Set(labels).size).toBe(labels.length);
  });
});
