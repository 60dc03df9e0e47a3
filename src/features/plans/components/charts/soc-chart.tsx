/**
 * SoC against the steady cycle with its band shaded (± band % of usable
 * energy), the entry arc and the leaving arc marked, the lookahead dashed.
 */
import { AreaSeries, Axis, GlyphSeries, LineSeries } from '@visx/xychart';
import { ChartFigure, ChartPlot } from '@/components/charts/chart-frame';
import { colours, lookaheadLine } from '@/components/charts/chart-theme';
import { NearestTooltip } from '@/components/charts/chart-tooltip';
import { TimeAxis } from '@/components/charts/time-axis';
import { formatLocalTime, formatNumber } from '@/lib/format';
import { atStepEnd as x, extentOf, type SplitSteps, type StepPoint } from './chart-data';

interface Props {
  split: SplitSteps;
  timeZone: string;
  energyKwh: number;
  /** Half-width of the band in % of nameplate energy. */
  bandSocPct: number;
  /** The same in % of usable energy, as the figures say it. */
  bandPct: number;
}

export function SocChart({ split, timeZone, energyKwh, bandSocPct, bandPct }: Props) {
  const pct = (kwh: number | null) => (kwh === null ? null : (kwh / energyKwh) * 100);
  const withSteady = split.all.filter((p) => p.step.steadySocKwh !== null);
  const extent = extentOf(split.all, (p) => p.tEnd);
  return (
    <ChartFigure
      caption="State of charge against the steady cycle"
      legend={[
        { colour: colours.ink, label: 'SoC, delivery window' },
        { colour: colours.inkSoft, label: 'SoC, lookahead (dashed)', dashed: true },
        { colour: colours.seaglass, label: `steady cycle, band ±${bandPct} % of usable energy shaded` },
        { colour: colours.inkSoft, label: 'entry arc (dots)' },
        { colour: colours.amber, label: 'leaving arc (dots)' },
      ]}
    >
      <ChartPlot
        height={260}
        gridTicks={5}
        xScale={{ type: 'time' }}
        yScale={{ type: 'linear', domain: [0, 100] }}
        accessibilityLabel="SoC in % with the steady cycle and its band; the numbers are in the schedule table"
      >
        <TimeAxis timeZone={timeZone} {...extent} />
        <Axis orientation="left" numTicks={5} label="SoC %" />
        <AreaSeries
          dataKey="band"
          data={withSteady}
          xAccessor={x}
          yAccessor={(p) => pct(p.step.steadySocKwh)! + bandSocPct}
          y0Accessor={(p) => pct(p.step.steadySocKwh)! - bandSocPct}
          fill={colours.seaglassBand}
          fillOpacity={0.9}
          renderLine={false}
        />
        <LineSeries
          dataKey="steady cycle"
          data={withSteady}
          xAccessor={x}
          yAccessor={(p) => pct(p.step.steadySocKwh)}
          stroke={colours.seaglass}
          strokeWidth={1.5}
        />
        <LineSeries
          dataKey="SoC"
          data={split.delivery}
          xAccessor={x}
          yAccessor={(p) => p.step.socPct}
          stroke={colours.ink}
          strokeWidth={2}
        />
        {split.lookahead.length > 0 && (
          <LineSeries
            dataKey="SoC (lookahead)"
            data={split.lookahead}
            xAccessor={x}
            yAccessor={(p) => p.step.socPct}
            stroke={colours.inkSoft}
            strokeWidth={2}
            {...lookaheadLine}
          />
        )}
        {split.entry.length > 0 && (
          <GlyphSeries
            dataKey="entry arc"
            data={split.entry}
            xAccessor={x}
            yAccessor={(p) => p.step.socPct}
            colorAccessor={() => colours.inkSoft}
            size={6}
          />
        )}
        {split.leaving.length > 0 && (
          <GlyphSeries
            dataKey="leaving arc"
            data={split.leaving}
            xAccessor={x}
            yAccessor={(p) => p.step.socPct}
            colorAccessor={() => colours.amber}
            size={7}
          />
        )}
        <NearestTooltip<StepPoint>
          render={({ datum: p }) => (
            <>
              end of step {formatLocalTime(p.tEnd, timeZone)} {p.step.delivery ? '' : '(lookahead)'}
              <br />
              SoC {formatNumber(p.step.socPct, 1)} % · steady {formatNumber(pct(p.step.steadySocKwh), 1)} % ·{' '}
              {p.step.arc.replace('near', 'near steady')}
            </>
          )}
        />
      </ChartPlot>
    </ChartFigure>
  );
}
