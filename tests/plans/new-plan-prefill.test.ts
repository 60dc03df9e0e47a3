/** Links that open the plan form preset with another horizon ("Make a plan with N h" on the horizon preview). */
import { describe, expect, it } from 'vitest';
import type { Plan } from '@shared/schemas/plan';
import {
  newPlanUrl,
  prefillFromSearch,
  prefilledTerminal,
  prefilledWindow,
  runSourceOf,
} from '../../src/features/plans/components/new-plan-prefill';
import { steadyDaysOf } from '../../src/components/steady-days-field';

const plan = {
  siteId: 's-1',
  batteryId: 'b-1',
  priceProfileId: 'p-1',
  loadProfileId: 'l-1',
  generationProfileId: null,
  deliveryStart: '2026-05-14T22:00:00.000Z',
  deliveryEnd: '2026-05-15T22:00:00.000Z',
  horizonHours: 24,
  terminalRule: 'target:80',
  initialSocPct: 42.5,
  inputs: { steadyDays: 'weekday' },
} as Plan;

describe('a preset plan form link', () => {
  it('carries everything of the plan but the horizon, which it replaces', () => {
    const url = newPlanUrl(plan, 36);
    expect(url.startsWith('/plans/new?')).toBe(true);
    const prefill = prefillFromSearch(new URL(url, 'http://x').searchParams);
    expect(prefill).toEqual({
      siteId: 's-1',
      batteryId: 'b-1',
      priceProfileId: 'p-1',
      loadProfileId: 'l-1',
      deliveryStart: plan.deliveryStart,
      deliveryEnd: plan.deliveryEnd,
      horizonHours: '36',
      terminalRule: 'target:80',
      initialSocPct: '42.5',
      steadyDays: 'weekday',
    });
    expect(steadyDaysOf(prefill.steadyDays)).toBe('weekday');
    expect(runSourceOf(prefill)).toEqual({
      siteId: 's-1',
      batteryId: 'b-1',
      priceProfileId: 'p-1',
      loadProfileId: 'l-1',
      generationProfileId: '',
    });
  });

  it('shows the window as wall times of the site’s zone and reads the terminal rule back', () => {
    const prefill = prefillFromSearch(new URL(newPlanUrl(plan, 36), 'http://x').searchParams);
    // [D] Berlin keeps summer time (UTC+2) in May: 22:00 UTC on 14 May is midnight on 15 May there.
    expect(prefilledWindow(prefill, 'Europe/Berlin')).toEqual({ start: '2026-05-15T00:00', end: '2026-05-16T00:00' });
    expect(prefilledWindow({}, 'Europe/Berlin')).toEqual({ start: '', end: '' });
    expect(prefilledTerminal('target:80')).toEqual({ kind: 'target', targetPct: '80' });
    expect(prefilledTerminal('free').kind).toBe('free');
    expect(prefilledTerminal('something else').kind).toBe('steady-value');
    // Plans made before the choice existed, and unknown words in a link, mean every day.
    expect(steadyDaysOf(undefined)).toBe('all');
    expect(steadyDaysOf('sundays')).toBe('all');
  });
});
