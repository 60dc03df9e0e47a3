/** Stored-energy value against SoC at a few times (exact path only): where energy is worth more or less. */
import { Axis, Grid, LineSeries, XYChart } from '@visx/xychart';
import type { PlanResults } from '@shared/schemas/plan';
import { formatLocalTime } from '@/lib/format';
import { chartMargin, chartTheme, colours } from './chart-theme';
import { ChartLegend } from './soc-chart';

const palette = [colours.ink, colours.seaglass, colours.amber, colours.inkSoft];

export function ValueCurvesChart({ curves, timeZone, currency }: { curves: PlanResults['valueCurves']; timeZone: string; currency: string }) {
  // At most four times, spread over the delivery window.
  const every = Math.max(1, Math.ceil(curves.length / 4));
  const shown = curves.filter((_, i) => i % every === 0).slice(0, 4);
  return (
    <figure className="rounded bg-white p-2 shadow-sm">
      <figcaption className="px-2 text-sm font-medium text-ink-800">Value of stored energy against SoC</figcaption>
      {/* XYChart takes its width from its parent, which needs the height or the chart collapses onto what follows. */}
      <div style={{ height: 220 }}>
        <XYChart height={220} theme={chartTheme} xScale={{ type: 'linear', domain: [0, 100] }} yScale={{ type: 'linear', nice: true, zero: false }} margin={{ ...chartMargin, bottom: 44 }}
          accessibilityLabel={`Stored-energy value in ${currency}/MWh against SoC in % at ${shown.length} times`}>
          <Grid columns={false} numTicks={4} />
          <Axis orientation="bottom" numTicks={5} label="SoC %" />
          <Axis orientation="left" numTicks={4} label={`${currency}/MWh`} />
          {shown.map((curve, i) => (
            <LineSeries key={curve.time} dataKey={curve.time} data={curve.points} xAccessor={(p) => p.socPct} yAccessor={(p) => p.value} stroke={palette[i]} strokeWidth={2} />
          ))}
        </XYChart>
      </div>
      <ChartLegend items={shown.map((c, i) => ({ colour: palette[i]!, label: `at ${formatLocalTime(Date.parse(c.time), timeZone)}` }))} />
    </figure>
  );
}
