/**
 * A line chart of one series (visx xychart). Default export so pages load it
 * with React.lazy: the chart libraries stay out of the first bundle.
 */
import { Axis, Grid, LineSeries, Tooltip, XYChart, buildChartTheme } from '@visx/xychart';
import { formatLocal, formatNumber } from '../lib/format';
import type { SeriesPoint } from '../lib/downsample';

// Colours from src/index.css: sea-glass line, ink structure (DESIGN section 7).
const theme = buildChartTheme({
  backgroundColor: '#ffffff',
  colors: ['#2f9c81'],
  gridColor: '#e3e9f2',
  gridColorDark: '#a4b3cc',
  tickLength: 4,
  svgLabelSmall: { fill: '#2a4470', fontFamily: 'Barlow, sans-serif', fontSize: 11 },
  svgLabelBig: { fill: '#13233f', fontFamily: 'Barlow, sans-serif', fontSize: 12 },
});

const accessors = { xAccessor: (p: SeriesPoint) => new Date(p.t), yAccessor: (p: SeriesPoint) => p.v };

export interface SeriesChartProps {
  points: SeriesPoint[];
  timeZone: string;
  unit: string;
  label: string;
  height?: number;
}

export default function SeriesChart({ points, timeZone, unit, label, height = 260 }: SeriesChartProps) {
  const tickDate = (d: Date | number) => formatLocal(typeof d === 'number' ? d : d.getTime(), timeZone).slice(0, 10);
  return (
    <figure className="rounded bg-white p-2 shadow-sm">
      {/* XYChart measures its parent for the width; the parent needs the height. */}
      <div style={{ height }}>
        <XYChart
          height={height}
          theme={theme}
          xScale={{ type: 'time' }}
          yScale={{ type: 'linear', nice: true, zero: false }}
          margin={{ top: 12, right: 16, bottom: 32, left: 64 }}
          accessibilityLabel={`${label}, ${unit}, ${points.length} points`}
        >
          <Grid columns={false} numTicks={5} />
          <Axis orientation="bottom" numTicks={6} tickFormat={tickDate} />
          <Axis orientation="left" numTicks={5} label={unit} tickFormat={(v: number) => formatNumber(v, 1)} />
          <LineSeries dataKey={label} data={points} {...accessors} />
          <Tooltip<SeriesPoint>
            snapTooltipToDatumX
            showVerticalCrosshair
            renderTooltip={({ tooltipData }) => {
              const p = tooltipData?.nearestDatum?.datum;
              return p ? (
                <span className="text-xs">
                  {formatLocal(p.t, timeZone)}
                  <br />
                  <strong>
                    {formatNumber(p.v)} {unit}
                  </strong>
                </span>
              ) : null;
            }}
          />
        </XYChart>
      </div>
      <figcaption className="sr-only">
        {label} in {unit}; the numbers are in the table below.
      </figcaption>
    </figure>
  );
}
