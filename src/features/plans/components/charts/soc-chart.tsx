/**
 * SoC against the steady cycle with its band shaded (± band % of usable
 * energy), the entry arc and the leaving arc marked, the lookahead dashed.
 */
import { AreaSeries, Axis, Grid, GlyphSeries, LineSeries, Tooltip, XYChart } from '@visx/xychart';
import { formatLocalTime, formatNumber } from '@/lib/format';
import { chartMargin, chartTheme, colours, lookaheadLine } from './chart-theme';
import { timeTick, type SplitSteps, type StepPoint } from './chart-data';

const x = (p: StepPoint) => new Date(p.tEnd);

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
  return (
    <figure className="rounded bg-white p-2 shadow-sm">
      <figcaption className="px-2 text-sm font-medium text-ink-800">State of charge against the steady cycle</figcaption>
      {/* XYChart takes its width from its parent, which needs the height or the chart collapses onto what follows. */}
      <div style={{ height: 260 }}>
        <XYChart height={260} theme={chartTheme} xScale={{ type: 'time' }} yScale={{ type: 'linear', domain: [0, 100] }} margin={chartMargin}
          accessibilityLabel="SoC in % with the steady cycle and its band; the numbers are in the schedule table">
          <Grid columns={false} numTicks={5} />
          <Axis orientation="bottom" numTicks={6} tickFormat={timeTick(timeZone)} />
          <Axis orientation="left" numTicks={5} label="SoC %" />
          <AreaSeries dataKey="band" data={withSteady} xAccessor={x} yAccessor={(p) => pct(p.step.steadySocKwh)! + bandSocPct}
            y0Accessor={(p) => pct(p.step.steadySocKwh)! - bandSocPct} fill={colours.seaglassBand} fillOpacity={0.9} renderLine={false} />
          <LineSeries dataKey="steady cycle" data={withSteady} xAccessor={x} yAccessor={(p) => pct(p.step.steadySocKwh)} stroke={colours.seaglass} strokeWidth={1.5} />
          <LineSeries dataKey="SoC" data={split.delivery} xAccessor={x} yAccessor={(p) => p.step.socPct} stroke={colours.ink} strokeWidth={2} />
          {split.lookahead.length > 0 && (
            <LineSeries dataKey="SoC (lookahead)" data={split.lookahead} xAccessor={x} yAccessor={(p) => p.step.socPct} stroke={colours.inkSoft} strokeWidth={2} {...lookaheadLine} />
          )}
          {split.entry.length > 0 && (
            <GlyphSeries dataKey="entry arc" data={split.entry} xAccessor={x} yAccessor={(p) => p.step.socPct} colorAccessor={() => colours.inkSoft} size={6} />
          )}
          {split.leaving.length > 0 && (
            <GlyphSeries dataKey="leaving arc" data={split.leaving} xAccessor={x} yAccessor={(p) => p.step.socPct} colorAccessor={() => colours.amber} size={7} />
          )}
          <Tooltip<StepPoint>
            snapTooltipToDatumX
            showVerticalCrosshair
            renderTooltip={({ tooltipData }) => {
              const p = tooltipData?.nearestDatum?.datum;
              return p ? (
                <span className="text-xs">
                  end of step {formatLocalTime(p.tEnd, timeZone)} {p.step.delivery ? '' : '(lookahead)'}
                  <br />
                  SoC {formatNumber(p.step.socPct, 1)} % · steady {formatNumber(pct(p.step.steadySocKwh), 1)} % · {p.step.arc.replace('near', 'near steady')}
                </span>
              ) : null;
            }}
          />
        </XYChart>
      </div>
      <ChartLegend
        items={[
          { colour: colours.ink, label: 'SoC, delivery window' },
          { colour: colours.inkSoft, label: 'SoC, lookahead (dashed)', dashed: true },
          { colour: colours.seaglass, label: `steady cycle, band ±${bandPct} % of usable energy shaded` },
          { colour: colours.inkSoft, label: 'entry arc (dots)' },
          { colour: colours.amber, label: 'leaving arc (dots)' },
        ]}
      />
    </figure>
  );
}

export function ChartLegend({ items }: { items: { colour: string; label: string; dashed?: boolean }[] }) {
  return (
    <ul className="flex flex-wrap gap-x-4 gap-y-1 px-2 pt-1 text-xs text-ink-700">
      {items.map((item) => (
        <li key={item.label} className="flex items-center gap-1.5">
          <svg width="18" height="6" aria-hidden="true">
            <line x1="0" y1="3" x2="18" y2="3" stroke={item.colour} strokeWidth="3" strokeDasharray={item.dashed ? '4 3' : undefined} />
          </svg>
          {item.label}
        </li>
      ))}
    </ul>
  );
}
