/**
 * Terminal rules as users choose them (`free`, `cyclic`, `target:80`,
 * `steady-value`) and their resolution into the engine's TerminalRule for a
 * window ending at a given step: `steady-value` takes the steady cycle's
 * stored-energy value λ̄ at the local time of day of the window's end.
 */
import type { TerminalRule } from '../types';
import type { AlignedInputs } from '../inputs/align-inputs';
import { steadyValueAt, type SteadyCycle } from '../steady/solve-steady-cycle';

export type TerminalChoice =
  | { readonly kind: 'free' }
  | { readonly kind: 'cyclic' }
  | { readonly kind: 'target'; readonly socPct: number }
  | { readonly kind: 'steady-value' };

export type ParsedTerminal = { ok: true; choice: TerminalChoice } | { ok: false; message: string };

export function parseTerminal(text: string): ParsedTerminal {
  const value = text.trim();
  if (value === 'free' || value === 'cyclic' || value === 'steady-value') return { ok: true, choice: { kind: value } };
  const target = /^target:(.+)$/.exec(value);
  if (target) {
    const pct = Number(target[1]);
    if (Number.isFinite(pct) && pct >= 0 && pct <= 100) return { ok: true, choice: { kind: 'target', socPct: pct } };
    return { ok: false, message: `the terminal target "${target[1]}" must be a percentage between 0 and 100, e.g. target:50` };
  }
  return { ok: false, message: `unknown terminal rule "${value}": use free, cyclic, steady-value or target:PCT` };
}

export function terminalLabel(choice: TerminalChoice): string {
  return choice.kind === 'target' ? `target:${choice.socPct}` : choice.kind;
}

/** Local minute of day at the boundary before step `index` (the grid end counts as a boundary). */
export function minuteOfDayAt(inputs: AlignedInputs, index: number): number {
  const { minuteOfDay } = inputs.clock;
  if (index < minuteOfDay.length) return minuteOfDay[index]!;
  return (minuteOfDay[minuteOfDay.length - 1]! + inputs.stepMinutes) % 1440;
}

/** The engine rule for a window ending at step `endIndex` (exclusive). Needs the steady cycle for steady-value. */
export function terminalRuleFor(
  choice: TerminalChoice,
  inputs: AlignedInputs,
  endIndex: number,
  steady?: SteadyCycle,
): TerminalRule {
  if (choice.kind !== 'steady-value') return choice;
  if (!steady || steady.status !== 'optimal') return { kind: 'free' };
  return { kind: 'steady-value', valuePerMwh: steadyValueAt(steady, minuteOfDayAt(inputs, endIndex)) };
}
