/** Stored-energy value (the dual of the SoC equation) against its steady value, lookahead dashed. */
import { Axis, LineSeries } from '@visx/xychart';
import { ChartFigure, ChartPlot } from '@/components/charts/chart-frame';
import { colours, lookaheadLine } from '@/components/charts/chart-theme';
import { TimeAxis } from '@/components/charts/time-axis';
import { atStepEnd as x, extentOf, type SplitSteps } from './chart-data';

export function ValueChart({ split, timeZone, currency }: { split: SplitSteps; timeZone: string; currency: string }) {
  const steady = split.all.filter((p) => p.step.steadyValue !== null);
  const extent = extentOf(split.all, (p) => p.tEnd);
  return (
    <ChartFigure
      caption="Stored-energy value against its steady value"
      legend={[
        { colour: colours.ink, label: 'stored-energy value' },
        { colour: colours.inkSoft, label: 'lookahead', dashed: true },
        { colour: colours.seaglass, label: 'steady cycle’s value at that time of day' },
      ]}
    >
      <ChartPlot
        height={220}
        gridTicks={4}
        xScale={{ type: 'time' }}
        yScale={{ type: 'linear', nice: true, zero: false }}
        accessibilityLabel={`Value of one more MWh stored, ${currency}/MWh, and the steady cycle's value`}
      >
        <TimeAxis timeZone={timeZone} {...extent} />
        <Axis orientation="left" numTicks={4} label={`${currency}/MWh`} />
        <LineSeries
          dataKey="steady value"
          data={steady}
          xAccessor={x}
          yAccessor={(p) => p.step.steadyValue}
          stroke={colours.seaglass}
        />
        <LineSeries
          dataKey="stored-energy value"
          data={split.delivery}
          xAccessor={x}
          yAccessor={(p) => p.step.storedEnergyValue}
          stroke={colours.ink}
          strokeWidth={2}
        />
        {split.lookahead.length > 0 && (
          <LineSeries
            dataKey="value (lookahead)"
            data={split.lookahead}
            xAccessor={x}
            yAccessor={(p) => p.step.storedEnergyValue}
            stroke={colours.inkSoft}
            {...lookaheadLine}
          />
        )}
      </ChartPlot>
    </ChartFigure>
  );
}
