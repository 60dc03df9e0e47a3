/** Distance to the steady cycle over time (% of usable energy), with the band edge and the arcs marked. */
import { Axis, GlyphSeries, LineSeries } from '@visx/xychart';
import { ChartFigure, ChartPlot } from '@/components/charts/chart-frame';
import { colours, lookaheadLine } from '@/components/charts/chart-theme';
import { TimeAxis } from '@/components/charts/time-axis';
import { formatNumber } from '@/lib/format';
import { atStepEnd as x, extentOf, type SplitSteps, type StepPoint } from './chart-data';

const y = (p: StepPoint) => (p.step.distance === null ? null : p.step.distance * 100);

export function DistanceChart({ split, timeZone, bandPct }: { split: SplitSteps; timeZone: string; bandPct: number }) {
  // The band edge spans the steps' ends, like the distance itself.
  const edge = split.all.map((p) => ({ t: p.tEnd, v: bandPct }));
  const extent = extentOf(split.all, (p) => p.tEnd);
  return (
    <ChartFigure
      caption="Distance to the steady cycle"
      legend={[
        { colour: colours.ink, label: 'distance, delivery window' },
        { colour: colours.inkSoft, label: 'lookahead', dashed: true },
        { colour: colours.seaglass, label: `band edge (${bandPct} %)`, dashed: true },
        { colour: colours.amber, label: 'leaving arc' },
      ]}
    >
      <ChartPlot
        height={200}
        gridTicks={4}
        xScale={{ type: 'time' }}
        yScale={{ type: 'linear', nice: true, zero: true }}
        accessibilityLabel="Distance to the steady cycle in % of usable energy per step"
      >
        <TimeAxis timeZone={timeZone} {...extent} />
        <Axis orientation="left" numTicks={4} label="% of usable energy" tickFormat={(v: number) => formatNumber(v, 0)} />
        <LineSeries
          dataKey="band edge"
          data={edge}
          xAccessor={(d) => new Date(d.t)}
          yAccessor={(d) => d.v}
          stroke={colours.seaglass}
          strokeDasharray="2 3"
        />
        <LineSeries dataKey="distance" data={split.delivery} xAccessor={x} yAccessor={y} stroke={colours.ink} strokeWidth={2} />
        {split.lookahead.length > 0 && (
          <LineSeries
            dataKey="distance (lookahead)"
            data={split.lookahead}
            xAccessor={x}
            yAccessor={y}
            stroke={colours.inkSoft}
            {...lookaheadLine}
          />
        )}
        {split.entry.length > 0 && (
          <GlyphSeries
            dataKey="entry arc"
            data={split.entry}
            xAccessor={x}
            yAccessor={y}
            colorAccessor={() => colours.inkSoft}
            size={6}
          />
        )}
        {split.leaving.length > 0 && (
          <GlyphSeries
            dataKey="leaving arc"
            data={split.leaving}
            xAccessor={x}
            yAccessor={y}
            colorAccessor={() => colours.amber}
            size={7}
          />
        )}
      </ChartPlot>
    </ChartFigure>
  );
}
