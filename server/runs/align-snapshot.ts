/** A run's snapshot (battery and site) with its profile values, on one time grid: the engine's alignment. Pure. */
import type { BatterySnapshot, SiteSnapshot } from '@shared/schemas/plan';
import { alignInputs } from '../engine';
import type { SnapshotSeries } from './profile-series';

export function alignSnapshot(snapshot: { battery: BatterySnapshot; site: SiteSnapshot }, series: SnapshotSeries) {
  return alignInputs({
    battery: snapshot.battery,
    site: snapshot.site,
    prices: series.price,
    ...(series.load ? { load: series.load } : {}),
    ...(series.generation ? { generation: series.generation } : {}),
  });
}
