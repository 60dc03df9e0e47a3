/** Stored-energy value (the dual of the SoC equation) against its steady value, lookahead dashed. */
import { Axis, Grid, LineSeries, XYChart } from '@visx/xychart';
import { chartMargin, chartTheme, colours, lookaheadLine } from './chart-theme';
import { timeTick, type SplitSteps, type StepPoint } from './chart-data';
import { ChartLegend } from './soc-chart';

const x = (p: StepPoint) => new Date(p.tEnd);

export function ValueChart({ split, timeZone, currency }: { split: SplitSteps; timeZone: string; currency: string }) {
  const steady = split.all.filter((p) => p.step.steadyValue !== null);
  return (
    <figure className="rounded bg-white p-2 shadow-sm">
      <figcaption className="px-2 text-sm font-medium text-ink-800">Stored-energy value against its steady value</figcaption>
      {/* XYChart takes its width from its parent, which needs the height or the chart collapses onto what follows. */}
      <div style={{ height: 220 }}>
        <XYChart height={220} theme={chartTheme} xScale={{ type: 'time' }} yScale={{ type: 'linear', nice: true, zero: false }} margin={chartMargin}
          accessibilityLabel={`Value of one more MWh stored, ${currency}/MWh, and the steady cycle's value`}>
          <Grid columns={false} numTicks={4} />
          {/* Half width: fewer time labels, or they run together. */}
          <Axis orientation="bottom" numTicks={3} tickFormat={timeTick(timeZone)} />
          <Axis orientation="left" numTicks={4} label={`${currency}/MWh`} />
          <LineSeries dataKey="steady value" data={steady} xAccessor={x} yAccessor={(p) => p.step.steadyValue} stroke={colours.seaglass} />
          <LineSeries dataKey="stored-energy value" data={split.delivery} xAccessor={x} yAccessor={(p) => p.step.storedEnergyValue} stroke={colours.ink} strokeWidth={2} />
          {split.lookahead.length > 0 && (
            <LineSeries dataKey="value (lookahead)" data={split.lookahead} xAccessor={x} yAccessor={(p) => p.step.storedEnergyValue} stroke={colours.inkSoft} {...lookaheadLine} />
          )}
        </XYChart>
      </div>
      <ChartLegend
        items={[
          { colour: colours.ink, label: 'stored-energy value' },
          { colour: colours.inkSoft, label: 'lookahead', dashed: true },
          { colour: colours.seaglass, label: 'steady cycle’s value at that time of day' },
        ]}
      />
    </figure>
  );
}
