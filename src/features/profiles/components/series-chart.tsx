/**
 * A line chart of one series (visx xychart). Default export so pages load it
 * with React.lazy: the chart libraries stay out of the first bundle.
 */
import { Axis, LineSeries } from '@visx/xychart';
import { ChartFigure, ChartPlot } from '@/components/charts/chart-frame';
import { chartThemeWith, colours } from '@/components/charts/chart-theme';
import { NearestTooltip } from '@/components/charts/chart-tooltip';
import { TimeAxis } from '@/components/charts/time-axis';
import { formatLocalTime, formatNumber } from '@/lib/format';
import type { SeriesPoint } from '../lib/downsample';

// A profile is one sea-glass line, where the plans' first series is ink.
const theme = chartThemeWith([colours.seaglass]);

const accessors = { xAccessor: (p: SeriesPoint) => new Date(p.t), yAccessor: (p: SeriesPoint) => p.v };

export interface SeriesChartProps {
  points: SeriesPoint[];
  timeZone: string;
  unit: string;
  label: string;
  height?: number;
}

export default function SeriesChart({ points, timeZone, unit, label, height = 260 }: SeriesChartProps) {
  const startMs = points[0]?.t ?? 0;
  const endMs = points.at(-1)?.t ?? 0;
  return (
    // The page titles the chart; the caption names it for screen readers.
    <ChartFigure hideCaption caption={`${label} in ${unit}; the numbers are in the table below.`}>
      <ChartPlot
        height={height}
        gridTicks={5}
        theme={theme}
        xScale={{ type: 'time' }}
        yScale={{ type: 'linear', nice: true, zero: false }}
        accessibilityLabel={`${label}, ${unit}, ${points.length} points`}
      >
        <TimeAxis timeZone={timeZone} startMs={startMs} endMs={endMs} />
        <Axis orientation="left" numTicks={5} label={unit} tickFormat={(v: number) => formatNumber(v, 1)} />
        <LineSeries dataKey={label} data={points} {...accessors} />
        <NearestTooltip<SeriesPoint>
          render={({ datum: p }) => (
            <>
              {formatLocalTime(p.t, timeZone)}
              <br />
              <strong>
                {formatNumber(p.v, 3)} {unit}
              </strong>
            </>
          )}
        />
      </ChartPlot>
    </ChartFigure>
  );
}
