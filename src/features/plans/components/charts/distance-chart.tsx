/** Distance to the steady cycle over time (% of usable energy), with the band edge and the arcs marked. */
import { Axis, Grid, GlyphSeries, LineSeries, XYChart } from '@visx/xychart';
import { formatNumber } from '@/lib/format';
import { chartMargin, chartTheme, colours, lookaheadLine } from './chart-theme';
import { timeTick, type SplitSteps, type StepPoint } from './chart-data';
import { ChartLegend } from './soc-chart';

const x = (p: StepPoint) => new Date(p.tEnd);
const y = (p: StepPoint) => (p.step.distance === null ? null : p.step.distance * 100);

export function DistanceChart({ split, timeZone, bandPct }: { split: SplitSteps; timeZone: string; bandPct: number }) {
  const edge = split.all.map((p) => ({ t: p.t, v: bandPct }));
  return (
    <figure className="rounded bg-white p-2 shadow-sm">
      <figcaption className="px-2 text-sm font-medium text-ink-800">Distance to the steady cycle</figcaption>
      {/* XYChart takes its width from its parent, which needs the height or the chart collapses onto what follows. */}
      <div style={{ height: 200 }}>
        <XYChart height={200} theme={chartTheme} xScale={{ type: 'time' }} yScale={{ type: 'linear', nice: true, zero: true }} margin={chartMargin}
          accessibilityLabel="Distance to the steady cycle in % of usable energy per step">
          <Grid columns={false} numTicks={4} />
          {/* Half width: fewer time labels, or they run together. */}
          <Axis orientation="bottom" numTicks={3} tickFormat={timeTick(timeZone)} />
          <Axis orientation="left" numTicks={4} label="% of usable energy" tickFormat={(v: number) => formatNumber(v, 0)} />
          <LineSeries dataKey="band edge" data={edge} xAccessor={(d) => new Date(d.t)} yAccessor={(d) => d.v} stroke={colours.seaglass} strokeDasharray="2 3" />
          <LineSeries dataKey="distance" data={split.delivery} xAccessor={x} yAccessor={y} stroke={colours.ink} strokeWidth={2} />
          {split.lookahead.length > 0 && <LineSeries dataKey="distance (lookahead)" data={split.lookahead} xAccessor={x} yAccessor={y} stroke={colours.inkSoft} {...lookaheadLine} />}
          {split.entry.length > 0 && <GlyphSeries dataKey="entry arc" data={split.entry} xAccessor={x} yAccessor={y} colorAccessor={() => colours.inkSoft} size={6} />}
          {split.leaving.length > 0 && <GlyphSeries dataKey="leaving arc" data={split.leaving} xAccessor={x} yAccessor={y} colorAccessor={() => colours.amber} size={7} />}
        </XYChart>
      </div>
      <ChartLegend
        items={[
          { colour: colours.ink, label: 'distance, delivery window' },
          { colour: colours.inkSoft, label: 'lookahead', dashed: true },
          { colour: colours.seaglass, label: `band edge (${bandPct} %)`, dashed: true },
          { colour: colours.amber, label: 'leaving arc' },
        ]}
      />
    </figure>
  );
}
