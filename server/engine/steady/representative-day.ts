/**
 * The representative day: every profile averaged by local clock slot (00:00,
 * 01:00, … in the site's zone). DST days map by local clock too: the
 * spring-forward day contributes nothing to the skipped slot and the fall-back
 * day contributes both of its repeated intervals to the repeated slot. Both
 * are reported in the notes.
 */
import type { InputIssue } from '../model/validate-battery';
import type { AlignedInputs } from '../inputs/align-inputs';
import { clockLabel, localDateLabel, weekdayOf } from '../time/zone-offsets';

export type DaySelection = 'all' | 'weekday' | 'weekend';

export interface DstDay {
  readonly date: string;
  readonly hours: number;
}

export interface RepresentativeDay {
  readonly slotMinutes: number;
  /** Minute of day at the start of each slot. */
  readonly slotStartMinutes: readonly number[];
  readonly priceImport: readonly number[];
  readonly priceExport: readonly number[];
  readonly loadKw: readonly number[];
  readonly generationKw: readonly number[];
  /** Intervals averaged into each slot. */
  readonly samples: readonly number[];
  readonly days: number;
  readonly dstDays: readonly DstDay[];
  readonly notes: readonly string[];
}

export type RepresentativeResult = { ok: true; day: RepresentativeDay } | { ok: false; issue: InputIssue };

function selected(localDay: number, days: DaySelection): boolean {
  if (days === 'all') return true;
  const weekday = weekdayOf(localDay);
  const weekend = weekday === 0 || weekday === 6;
  return days === 'weekend' ? weekend : !weekend;
}

function dstDays(inputs: AlignedInputs, from: number, to: number, days: DaySelection): DstDay[] {
  const { localDay, offsetMin } = inputs.clock;
  const found: DstDay[] = [];
  for (let t = from + 1; t < to; t++) {
    if (offsetMin[t] !== offsetMin[t - 1] && selected(localDay[t]!, days)) {
      found.push({ date: localDateLabel(localDay[t]!), hours: 24 - (offsetMin[t]! - offsetMin[t - 1]!) / 60 });
    }
  }
  return found;
}

function dstNote(list: readonly DstDay[]): string | null {
  if (list.length === 0) return null;
  const parts = list.map((d) =>
    d.hours < 24
      ? `${d.date} (${d.hours} h: the skipped local hour has no data that day)`
      : `${d.date} (${d.hours} h: both repeated local hours are averaged into their clock slot)`,
  );
  return `${list.length} daylight-saving day${list.length > 1 ? 's' : ''} mapped by local clock: ${parts.join('; ')}`;
}

export function representativeDay(
  inputs: AlignedInputs,
  from = 0,
  to = inputs.timesMs.length,
  days: DaySelection = 'all',
): RepresentativeResult {
  const slotMinutes = inputs.stepMinutes;
  if (1440 % slotMinutes !== 0) {
    return {
      ok: false,
      issue: { field: 'prices', message: `a ${slotMinutes}-minute step does not divide a day into clock slots` },
    };
  }
  const slots = 1440 / slotMinutes;
  const sums = [new Float64Array(slots), new Float64Array(slots), new Float64Array(slots), new Float64Array(slots)];
  const samples = new Array<number>(slots).fill(0);
  const series = [inputs.priceImport, inputs.priceExport, inputs.loadKw, inputs.generationKw];
  const daySet = new Set<number>();
  for (let t = from; t < to; t++) {
    const day = inputs.clock.localDay[t]!;
    if (!selected(day, days)) continue;
    const slot = Math.floor(inputs.clock.minuteOfDay[t]! / slotMinutes);
    daySet.add(day);
    samples[slot]! += 1;
    series.forEach((s, k) => (sums[k]![slot]! += s[t]!));
  }
  const empty = samples.findIndex((count) => count === 0);
  if (empty >= 0) {
    const which = days === 'all' ? '' : ` ${days}`;
    return {
      ok: false,
      issue: {
        field: 'prices',
        message: `the representative${which} day has no data for the ${clockLabel(empty * slotMinutes)} slot: the profile must cover at least one whole${which} day`,
      },
    };
  }
  const mean = (k: number) => Array.from(sums[k]!, (sum, slot) => sum / samples[slot]!);
  const dst = dstDays(inputs, from, to, days);
  const note = dstNote(dst);
  return {
    ok: true,
    day: {
      slotMinutes,
      slotStartMinutes: Array.from({ length: slots }, (_, k) => k * slotMinutes),
      priceImport: mean(0),
      priceExport: mean(1),
      loadKw: mean(2),
      generationKw: mean(3),
      samples,
      days: daySet.size,
      dstDays: dst,
      notes: [
        `averaged over ${daySet.size} ${days === 'all' ? '' : `${days} `}days by local clock slot`,
        ...(note ? [note] : []),
      ],
    },
  };
}
