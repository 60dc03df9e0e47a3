/**
 * Time-axis ticks in the site's own clock: round local times, thinned to what fits, dates
 * only where the day changes. Instants are RFC 3339 literals read with Date.parse.
 */
import { describe, expect, it } from 'vitest';
import { siteTimeTicks, timeTickLabels } from '../../src/components/charts/time-ticks';

const BERLIN = 'Europe/Berlin';
const at = (iso: string) => Date.parse(iso);

describe('time-axis ticks', () => {
  it('picks the finest round local step that fits, with the date only where the day changes', () => {
    const start = at('2026-12-04T00:00:00+01:00');
    const end = at('2026-12-06T00:00:00+01:00');
    // [D] 48 h: every 6 h gives 9 ticks (too many for 8), every 12 h gives 5.
    const ticks = siteTimeTicks(start, end, BERLIN, 8);
    expect(ticks.values.map((ms) => new Date(ms).toISOString())).toEqual([
      '2026-12-03T23:00:00.000Z',
      '2026-12-04T11:00:00.000Z',
      '2026-12-04T23:00:00.000Z',
      '2026-12-05T11:00:00.000Z',
      '2026-12-05T23:00:00.000Z',
    ]);
    expect(timeTickLabels(ticks, BERLIN)).toEqual(['00:00\n4 Dec', '12:00', '00:00\n5 Dec', '12:00', '00:00\n6 Dec']);
    // A narrow chart (a phone) gets fewer, never overlapping.
    expect(siteTimeTicks(start, end, BERLIN, 3).values).toHaveLength(3);
  });

  it('counts hours on the local clock across the spring change [S: Directive 2000/84/EC, Art. 2]', () => {
    // 2026-03-29: 02:00 CET jumps to 03:00 CEST, so the local day has 23 hours.
    const ticks = siteTimeTicks(at('2026-03-29T00:00:00+01:00'), at('2026-03-30T00:00:00+02:00'), BERLIN, 5);
    expect(timeTickLabels(ticks, BERLIN)).toEqual(['00:00\n29 Mar', '06:00', '12:00', '18:00', '00:00\n30 Mar']);
    expect(ticks.values[1]).toBe(at('2026-03-29T06:00:00+02:00'));
  });

  it('chooses among the steps of a bar chart only, since its band scale knows no other values', () => {
    const grid = Array.from({ length: 96 }, (_, i) => at('2026-05-07T00:00:00+02:00') + i * 15 * 60_000);
    const ticks = siteTimeTicks(grid[0]!, grid.at(-1)!, BERLIN, 6, grid);
    expect(ticks.values.every((v) => grid.includes(v))).toBe(true);
    expect(timeTickLabels(ticks, BERLIN)).toEqual(['00:00\n7 May', '06:00', '12:00', '18:00']);
  });

  it('writes whole days and months without a time of day on long ranges', () => {
    const year = siteTimeTicks(at('2026-01-01T00:00:00+01:00'), at('2027-01-01T00:00:00+01:00'), BERLIN, 7);
    expect(year.daily).toBe(true);
    // [D] every 2 months from 1 Jan: Jan, Mar, May, Jul, Sep, Nov, Jan = 7 ticks.
    expect(timeTickLabels(year, BERLIN)).toEqual(['1 Jan\n2026', '1 Mar', '1 May', '1 Jul', '1 Sep', '1 Nov', '1 Jan\n2027']);
  });
});
