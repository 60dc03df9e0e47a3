import { describe, expect, it } from 'vitest';
import { downsampleMinMax } from '../../src/features/profiles/lib/downsample';

describe('thinning a series for the chart', () => {
  it('keeps short series whole, one point per interval at its start time', () => {
    const points = downsampleMinMax(1000, 60_000, [3, -1, 4]);
    expect(points).toEqual([
      { t: 1000, v: 3 },
      { t: 61_000, v: -1 },
      { t: 121_000, v: 4 },
    ]);
  });

  it("keeps every bucket's lowest and highest value, so a single negative spike in a year survives", () => {
    // [D] 105 120 five-minute values, all 50 except one −400 spike; 800 buckets of 132 values each.
    const values = new Array<number>(105_120).fill(50);
    values[77_777] = -400;
    const points = downsampleMinMax(0, 300_000, values, 800);
    expect(points.length).toBeLessThanOrEqual(1600);
    expect(Math.min(...points.map((p) => p.v))).toBe(-400);
    expect(points.find((p) => p.v === -400)?.t).toBe(77_777 * 300_000);
    // Points stay in time order for the line.
    expect(points.every((p, k) => k === 0 || p.t > (points[k - 1]?.t ?? -1))).toBe(true);
  });
});
