/**
 * Terminal rules as text (docs/model.md): `free`, `cyclic` (end SoC = start
 * SoC), `steady-value` (end energy valued at the steady cycle's stored-energy
 * value) and `target:<pct>` (end SoC at least pct % of nameplate energy).
 */
import { z } from 'zod';

export type TerminalRuleText = 'free' | 'cyclic' | 'steady-value' | `target:${number}`;

const pattern = /^(free|cyclic|steady-value|target:(\d{1,3}(\.\d+)?))$/;

export const terminalRuleSchema = z
  .string({ error: 'Give the terminal rule as free, cyclic, steady-value or target:<SoC %>, e.g. target:50.' })
  .trim()
  .refine((text) => pattern.test(text), 'Use free, cyclic, steady-value or target:<SoC %> (e.g. target:50).')
  .refine((text) => !text.startsWith('target:') || Number(text.slice(7)) <= 100, 'A target SoC is at most 100 %.')
  .transform((text) => text as TerminalRuleText);

/** The target SoC in %, or null for the other rules. */
export function terminalTargetPct(rule: string): number | null {
  return rule.startsWith('target:') ? Number(rule.slice(7)) : null;
}

/** Words for screens. */
export function describeTerminalRule(rule: string): string {
  if (rule === 'free') return 'free end (nothing values energy left at the end)';
  if (rule === 'cyclic') return 'cyclic (ends with the SoC it started with)';
  if (rule === 'steady-value') return 'steady value (energy left is worth the steady cycle’s stored-energy value)';
  const target = terminalTargetPct(rule);
  return target === null ? rule : `target (ends at ${target} % SoC or more)`;
}
