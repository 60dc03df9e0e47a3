/** The horizons a preview accepts, from the plan's inputs snapshot alone (the page and the server share it). */
import { describe, expect, it } from 'vitest';
import { horizonPreviewLimits, MAX_PREVIEW_STEPS } from '@shared/schemas/horizon-preview';
import type { ProfileRef } from '@shared/schemas/plan';

const ref = (kind: ProfileRef['kind'], start: string, end: string, stepMinutes: number): ProfileRef => ({
  id: kind,
  name: kind,
  kind,
  start,
  end,
  stepMinutes,
  sha256: '0'.repeat(64),
});

describe('preview limits', () => {
  it('run from the delivery window to where the shortest profile ends, on the finest step', () => {
    const limits = horizonPreviewLimits({
      deliveryStart: '2026-03-02T00:00:00.000Z',
      deliveryEnd: '2026-03-02T06:00:00.000Z',
      profiles: {
        price: ref('price', '2026-03-01T00:00:00Z', '2026-03-10T00:00:00Z', 60),
        load: ref('load', '2026-03-01T00:00:00Z', '2026-03-04T12:00:00Z', 30),
        generation: null,
      },
    });
    // [D] The load ends 2 days 12 h after the delivery start: 60 h; the finest step is 30 min; 2016 steps of 30 min are 1008 h.
    expect(limits).toEqual({ minHours: 6, maxHours: 60, stepHours: 0.5, maxReason: 'data' });
  });

  it('stop at the step cap on fine data, whatever the data would allow', () => {
    const limits = horizonPreviewLimits({
      deliveryStart: '2026-03-02T00:00:00.000Z',
      deliveryEnd: '2026-03-03T00:00:00.000Z',
      profiles: { price: ref('price', '2026-03-01T00:00:00Z', '2026-04-01T00:00:00Z', 5), load: null, generation: null },
    });
    // [D] 2016 steps of 5 minutes are 168 h, less than the 30 days of data left.
    expect(MAX_PREVIEW_STEPS).toBe(2016);
    expect(limits).toEqual({ minHours: 24, maxHours: 168, stepHours: 5 / 60, maxReason: 'steps' });
  });
});
