import type { ReactNode } from 'react';
import { Tooltip } from '@visx/xychart';

interface NearestDatum<Datum> {
  datum: Datum;
  /** The dataKey of the series it belongs to. */
  key: string;
}

/** A tooltip on the datum nearest the pointer, snapped to its x under a vertical crosshair. */
export function NearestTooltip<Datum extends object>({ render }: { render: (nearest: NearestDatum<Datum>) => ReactNode }) {
  return (
    <Tooltip<Datum>
      snapTooltipToDatumX
      showVerticalCrosshair
      renderTooltip={({ tooltipData }) => {
        const nearest = tooltipData?.nearestDatum;
        return nearest ? <span className="text-xs">{render(nearest)}</span> : null;
      }}
    />
  );
}
