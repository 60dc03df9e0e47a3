/**
 * Links that open the plan form preset, e.g. "Make a plan with 36 h" from the
 * horizon preview: the plan's battery, profiles, window, rule and initial SoC
 * with another horizon. Instants travel as RFC 3339 text and become wall times
 * in the site's zone only in the form, once the zone is known.
 */
import type { Plan } from '@shared/schemas/plan';
import { emptyRunSource, type RunSource } from '@/components/run-source-fields';
import { toWallTimeInput } from '@/lib/format';
import type { TerminalKind } from './terminal-rule-field';

export interface PlanPrefill extends Partial<RunSource> {
  deliveryStart?: string;
  deliveryEnd?: string;
  horizonHours?: string;
  terminalRule?: string;
  initialSocPct?: string;
  steadyDays?: string;
}

const prefillKeys = [
  'siteId',
  'batteryId',
  'priceProfileId',
  'loadProfileId',
  'generationProfileId',
  'deliveryStart',
  'deliveryEnd',
  'horizonHours',
  'terminalRule',
  'initialSocPct',
  'steadyDays',
] as const satisfies readonly (keyof PlanPrefill)[];

/** `/plans/new?…` with everything of `plan` but the horizon. */
export function newPlanUrl(plan: Plan, horizonHours: number): string {
  const values: PlanPrefill = {
    siteId: plan.siteId,
    batteryId: plan.batteryId,
    priceProfileId: plan.priceProfileId,
    loadProfileId: plan.loadProfileId ?? '',
    generationProfileId: plan.generationProfileId ?? '',
    deliveryStart: plan.deliveryStart,
    deliveryEnd: plan.deliveryEnd,
    horizonHours: String(horizonHours),
    terminalRule: plan.terminalRule,
    initialSocPct: String(plan.initialSocPct),
    steadyDays: plan.inputs?.steadyDays ?? 'all',
  };
  const params = new URLSearchParams();
  for (const key of prefillKeys) if (values[key]) params.set(key, values[key]);
  return `/plans/new?${params.toString()}`;
}

export function prefillFromSearch(params: URLSearchParams): PlanPrefill {
  const prefill: PlanPrefill = {};
  for (const key of prefillKeys) {
    const value = params.get(key);
    if (value) prefill[key] = value;
  }
  return prefill;
}

export function runSourceOf(prefill: PlanPrefill | undefined): RunSource {
  const source = { ...emptyRunSource };
  for (const key of Object.keys(emptyRunSource) as (keyof RunSource)[]) source[key] = prefill?.[key] ?? '';
  return source;
}

/** The preset window as wall-time texts in `timeZone` ('' where none or unreadable). */
export function prefilledWindow(prefill: PlanPrefill | undefined, timeZone: string): { start: string; end: string } {
  const wall = (text: string | undefined) => {
    const ms = text ? Date.parse(text) : NaN;
    return Number.isFinite(ms) ? toWallTimeInput(ms, timeZone) : '';
  };
  return { start: wall(prefill?.deliveryStart), end: wall(prefill?.deliveryEnd) };
}

/** `target:80` → target at 80 %; no or unknown text → the form's default, steady value. */
export function prefilledTerminal(text: string | undefined): { kind: TerminalKind; targetPct: string } {
  if (text === 'free' || text === 'cyclic' || text === 'steady-value') return { kind: text, targetPct: '50' };
  const target = /^target:(.+)$/.exec(text ?? '');
  return target ? { kind: 'target', targetPct: target[1]! } : { kind: 'steady-value', targetPct: '50' };
}
