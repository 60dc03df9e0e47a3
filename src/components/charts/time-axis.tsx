/**
 * The bottom axis of every chart over time: ticks at round times in the site's clock, thinned
 * to the plot's width so labels never run together, dates only where the day changes, and the
 * labels at the ends kept inside the chart.
 */
import { useMemo } from 'react';
import { Axis } from '@visx/xychart';
import { usePlotBox } from './chart-frame';
import { siteTimeTicks, timeTickLabels } from './time-ticks';

/** A label needs about this much room (px) beside its neighbours. */
const LABEL_SPACING = 64;

interface TimeAxisProps {
  timeZone: string;
  startMs: number;
  endMs: number;
  /** For a band scale (bars): the step starts, the only values the scale knows. */
  grid?: readonly number[];
}

export function TimeAxis({ timeZone, startMs, endMs, grid }: TimeAxisProps) {
  const box = usePlotBox();
  const maxTicks = Math.floor((box.right - box.left) / LABEL_SPACING) + 1;
  const { values, labels } = useMemo(() => {
    const ticks = siteTimeTicks(startMs, endMs, timeZone, maxTicks, grid);
    const text = timeTickLabels(ticks, timeZone);
    return { values: ticks.values, labels: new Map(ticks.values.map((ms, i) => [ms, text[i] ?? ''])) };
  }, [startMs, endMs, timeZone, maxTicks, grid]);
  const labelOf = (v: number | Date) => labels.get(typeof v === 'number' ? v : v.getTime()) ?? '';
  return (
    <Axis
      orientation="bottom"
      tickValues={grid ? values : values.map((ms) => new Date(ms))}
      tickFormat={labelOf}
      tickComponent={({ x, y, formattedValue, ...props }) => {
        // Near an edge a centred label would be cut off: anchor it to that side instead.
        const anchor = x > box.width - 24 ? 'end' : x < 20 ? 'start' : 'middle';
        const [first, second] = (formattedValue ?? '').split('\n');
        return (
          <text {...props} x={x} y={y} textAnchor={anchor}>
            <tspan x={x}>{first}</tspan>
            {second && (
              <tspan x={x} dy="1.15em">
                {second}
              </tspan>
            )}
          </text>
        );
      }}
    />
  );
}
