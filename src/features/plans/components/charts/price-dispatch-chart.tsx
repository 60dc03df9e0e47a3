/** Price (line) over charge and discharge (bars, discharge below zero); the lookahead faded. */
import { Axis, BarSeries, LineSeries } from '@visx/xychart';
import { ChartFigure, ChartPlot } from '@/components/charts/chart-frame';
import { colours, lookaheadLine } from '@/components/charts/chart-theme';
import { NearestTooltip } from '@/components/charts/chart-tooltip';
import { TimeAxis } from '@/components/charts/time-axis';
import { formatLocalTime, formatNumber } from '@/lib/format';
import type { SplitSteps, StepPoint } from './chart-data';

const x = (p: StepPoint) => new Date(p.t);

export function PriceDispatchChart({ split, timeZone, currency }: { split: SplitSteps; timeZone: string; currency: string }) {
  // Every step in every bar series, so the band scale has one slot per step.
  const part = (delivery: boolean) => split.all.filter((p) => p.step.delivery === delivery);
  const grid = split.all.map((p) => p.t);
  return (
    <ChartFigure
      caption="Price and dispatch"
      className="space-y-1"
      legend={[
        { colour: colours.ink, label: 'price' },
        { colour: colours.seaglass, label: 'charge (above zero)' },
        { colour: colours.inkSoft, label: 'discharge (below zero)' },
        { colour: colours.inkFaint, label: 'lookahead: dashed price, pale bars', dashed: true },
      ]}
    >
      <ChartPlot
        height={180}
        gridTicks={4}
        xScale={{ type: 'time' }}
        yScale={{ type: 'linear', nice: true, zero: false }}
        accessibilityLabel={`Price in ${currency}/MWh per step; the numbers are in the schedule table`}
      >
        <Axis orientation="left" numTicks={4} label={`${currency}/MWh`} />
        <LineSeries
          dataKey="price"
          data={split.delivery}
          xAccessor={x}
          yAccessor={(p) => p.step.priceImport}
          stroke={colours.ink}
        />
        {split.lookahead.length > 0 && (
          <LineSeries
            dataKey="price (lookahead)"
            data={split.lookahead}
            xAccessor={x}
            yAccessor={(p) => p.step.priceImport}
            stroke={colours.inkSoft}
            {...lookaheadLine}
          />
        )}
        <NearestTooltip<StepPoint>
          render={({ datum: p }) => (
            <>
              {formatLocalTime(p.t, timeZone)} {p.step.delivery ? '' : '(lookahead)'}
              <br />
              price {formatNumber(p.step.priceImport, 2)} {currency}/MWh · charge {formatNumber(p.step.chargeKw, 0)} kW ·
              discharge {formatNumber(p.step.dischargeKw, 0)} kW
            </>
          )}
        />
      </ChartPlot>
      <ChartPlot
        height={170}
        gridTicks={4}
        xScale={{ type: 'band', paddingInner: 0.15 }}
        yScale={{ type: 'linear', nice: true }}
        accessibilityLabel="Charge (above zero) and discharge (below zero) in kW per step"
      >
        <TimeAxis timeZone={timeZone} startMs={grid[0] ?? 0} endMs={grid.at(-1) ?? 0} grid={grid} />
        <Axis orientation="left" numTicks={4} label="kW" />
        <BarSeries
          dataKey="charge"
          data={part(true)}
          xAccessor={(p) => p.t}
          yAccessor={(p) => p.step.chargeKw}
          colorAccessor={() => colours.seaglass}
        />
        <BarSeries
          dataKey="discharge"
          data={part(true)}
          xAccessor={(p) => p.t}
          yAccessor={(p) => -p.step.dischargeKw}
          colorAccessor={() => colours.inkSoft}
        />
        <BarSeries
          dataKey="charge (lookahead)"
          data={part(false)}
          xAccessor={(p) => p.t}
          yAccessor={(p) => p.step.chargeKw}
          colorAccessor={() => colours.seaglassSoft}
        />
        <BarSeries
          dataKey="discharge (lookahead)"
          data={part(false)}
          xAccessor={(p) => p.t}
          yAccessor={(p) => -p.step.dischargeKw}
          colorAccessor={() => colours.inkFaint}
        />
      </ChartPlot>
    </ChartFigure>
  );
}
