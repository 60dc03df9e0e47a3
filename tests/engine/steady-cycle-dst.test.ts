// The representative day by local clock slot (docs/model.md) from a profile that
// spans both daylight-saving changes of Europe/Berlin, and the steady cycle on it.
// Local hours are computed here with Intl (the runtime's zone data), not with the
// engine's own zone code.
import { describe, expect, it } from 'vitest';
import { alignInputs } from '../../server/engine/inputs/align-inputs';
import { representativeDay } from '../../server/engine/steady/representative-day';
import { solveSteadyCycle } from '../../server/engine/steady/solve-steady-cycle';
import { battery } from './support/problem-builder';

const zone = 'Europe/Berlin';
const hourFormat = new Intl.DateTimeFormat('en-GB', { timeZone: zone, hour: '2-digit', hourCycle: 'h23' });
const weekdayFormat = new Intl.DateTimeFormat('en-GB', { timeZone: zone, weekday: 'short' });
// 2026-01-01T00:00+01:00 to 2027-01-01T00:00+01:00: 8760 hours, spring forward on 2026-03-29, back on 2026-10-25.
const start = Date.UTC(2025, 11, 31, 23);
const times = Array.from({ length: 8760 }, (_, t) => start + t * 3_600_000);
const localHour = (ms: number) => Number(hourFormat.format(ms));
const weekend = (ms: number) => ['Sat', 'Sun'].includes(weekdayFormat.format(ms));

function inputsWith(price: (ms: number) => number) {
  const aligned = alignInputs({
    battery: battery(),
    site: { timezone: zone, importLimitKw: null, exportLimitKw: null, demandChargePerKw: null },
    prices: { startMs: start, stepMinutes: 60, values: times.map(price) },
  });
  if (!aligned.ok) throw new Error(aligned.issue.message);
  return aligned.inputs;
}

describe('representative day across both DST changes', () => {
  it('averages by local clock, so a price set by the local hour comes back exactly, and reports the 23 h and 25 h days', () => {
    // [D] If every interval's price is 10 × its local hour, the average of every local clock slot is exactly
    // 10 × that hour; mapping by UTC or by a fixed offset would mix summer and winter hours into each slot.
    const day = representativeDay(inputsWith((ms) => 10 * localHour(ms)));
    expect(day.ok).toBe(true);
    if (!day.ok) return;
    expect(day.day.priceImport).toEqual(Array.from({ length: 24 }, (_, h) => 10 * h));
    expect(day.day.dstDays).toEqual([
      { date: '2026-03-29', hours: 23 },
      { date: '2026-10-25', hours: 25 },
    ]);
    // [S] Directive 2000/84/EC (docs/sources.md): the autumn day repeats the local 02:00 hour, the spring day skips it.
    expect(day.day.samples[2]).toBe(365);
    expect(day.day.notes.join(' ')).toContain('2 daylight-saving days mapped by local clock');
  });

  it('builds separate weekday and weekend days when asked', () => {
    const inputs = inputsWith((ms) => 10 * localHour(ms) + (weekend(ms) ? 500 : 0));
    const weekdays = representativeDay(inputs, 0, times.length, 'weekday');
    const weekends = representativeDay(inputs, 0, times.length, 'weekend');
    if (!weekdays.ok || !weekends.ok) throw new Error('representative day failed');
    expect(weekdays.day.priceImport[7]).toBe(70);
    expect(weekends.day.priceImport[7]).toBe(570);
    expect(weekdays.day.days + weekends.day.days).toBe(365);
  });

  it('solves the steady cycle on it: one cycle from the cheapest to the dearest local hour', () => {
    // [D] Prices 10·h rise through the local day, so with 1 MW / 1 MWh and η = 1 the best periodic day buys
    // 1 MWh at 00:00 (price 0) and sells it at 23:00 (price 230): cost −230 per day, one equivalent cycle.
    const result = solveSteadyCycle(inputsWith((ms) => 10 * localHour(ms)));
    if (!result.ok) throw new Error(result.issue.message);
    const cycle = result.cycle;
    expect(cycle.costPerDay).toBeCloseTo(-230, 9);
    expect(cycle.equivalentCyclesPerDay).toBeCloseTo(1, 9);
    expect(cycle.slots[0]!.chargeKw).toBeCloseTo(1000, 6);
    expect(cycle.slots[23]!.dischargeKw).toBeCloseTo(1000, 6);
    expect(cycle.slots[23]!.time).toBe('23:00');
  });
});
