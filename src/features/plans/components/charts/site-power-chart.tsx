/**
 * What the site draws and makes, and what crosses the grid connection: load and PV (or other
 * generation) from the plan's profiles, the net grid exchange the plan leads to (import above
 * zero, export below) and the connection's import and export limits. Intervals where the
 * exchange would pass a limit are marked in brick red (a violation); the lookahead is dashed.
 */
import { Axis, GlyphSeries, LineSeries } from '@visx/xychart';
import { ChartFigure, ChartPlot, type LegendItem } from '@/components/charts/chart-frame';
import { colours, lookaheadLine } from '@/components/charts/chart-theme';
import { NearestTooltip } from '@/components/charts/chart-tooltip';
import { TimeAxis } from '@/components/charts/time-axis';
import { formatLocalTime, formatNumber } from '@/lib/format';
import type { SplitSteps, StepPoint } from './chart-data';

export interface SitePowerChartProps {
  split: SplitSteps;
  timeZone: string;
  /** kW per step of `split.all`, null where the profile has no value; null when the plan has no such profile. */
  load: (number | null)[] | null;
  generation: (number | null)[] | null;
  importLimitKw: number | null;
  exportLimitKw: number | null;
}

interface FlowPoint {
  t: number;
  load: number | null;
  generation: number | null;
  /** Import − export, kW. */
  net: number;
  step: StepPoint['step'];
}

/** A limit passed by more than a watt: solver tolerances stay below that. */
const TOLERANCE_KW = 0.001;

const x = (p: FlowPoint | { t: number }) => new Date(p.t);

export function SitePowerChart({ split, timeZone, load, generation, importLimitKw, exportLimitKw }: SitePowerChartProps) {
  const points: FlowPoint[] = split.all.map((p, i) => ({
    t: p.t,
    load: load?.[i] ?? null,
    generation: generation?.[i] ?? null,
    net: p.step.gridImportKw - p.step.gridExportKw,
    step: p.step,
  }));
  const delivery = points.slice(0, split.delivery.length);
  const lookahead = points.length > delivery.length ? points.slice(Math.max(0, delivery.length - 1)) : [];
  const ends = points.length > 0 ? [{ t: points[0]!.t }, { t: points.at(-1)!.t }] : [];
  const over = points.filter(
    (p) =>
      (importLimitKw !== null && p.net > importLimitKw + TOLERANCE_KW) ||
      (exportLimitKw !== null && -p.net > exportLimitKw + TOLERANCE_KW),
  );
  const legend: LegendItem[] = [
    { colour: colours.ink, label: 'net grid exchange (import above zero, export below)' },
    ...(load ? [{ colour: colours.slate, label: 'site load' }] : []),
    ...(generation ? [{ colour: colours.tide, label: 'generation (PV)' }] : []),
    { colour: colours.inkSoft, label: 'import and export limits', dashed: true },
    ...(over.length > 0 ? [{ colour: colours.brick, label: `beyond a limit (${over.length} intervals)` }] : []),
  ];
  const limits = [
    importLimitKw === null ? 'no import limit' : `import limit ${formatNumber(importLimitKw, 1)} kW`,
    exportLimitKw === null ? 'no export limit' : `export limit ${formatNumber(exportLimitKw, 1)} kW`,
  ].join(', ');
  return (
    <ChartFigure
      caption={
        load || generation ? 'Site load, generation and grid exchange against the limits' : 'Grid exchange against the limits'
      }
      legend={legend}
    >
      <p className="px-2 text-xs text-ink-500">
        {limits}
        {load || generation ? '' : '; this plan has no load or generation profile, so the grid exchange is the battery’s own.'}
      </p>
      <ChartPlot
        height={230}
        gridTicks={4}
        xScale={{ type: 'time' }}
        yScale={{ type: 'linear', nice: true, zero: true }}
        accessibilityLabel={`Load, generation and net grid exchange in kW per step against the site's limits (${limits}); the numbers are in the schedule table`}
      >
        <TimeAxis timeZone={timeZone} startMs={points[0]?.t ?? 0} endMs={points.at(-1)?.t ?? 0} />
        <Axis orientation="left" numTicks={4} label="kW" tickFormat={(v: number) => formatNumber(v, 0)} />
        {importLimitKw !== null && (
          <LineSeries
            dataKey="import limit"
            data={ends}
            xAccessor={x}
            yAccessor={() => importLimitKw}
            stroke={colours.inkSoft}
            strokeDasharray="6 4"
          />
        )}
        {exportLimitKw !== null && (
          <LineSeries
            dataKey="export limit"
            data={ends}
            xAccessor={x}
            yAccessor={() => -exportLimitKw}
            stroke={colours.inkSoft}
            strokeDasharray="6 4"
          />
        )}
        {load && <LineSeries dataKey="site load" data={points} xAccessor={x} yAccessor={(p) => p.load} stroke={colours.slate} />}
        {generation && (
          <LineSeries dataKey="generation" data={points} xAccessor={x} yAccessor={(p) => p.generation} stroke={colours.tide} />
        )}
        <LineSeries
          dataKey="net grid exchange"
          data={delivery}
          xAccessor={x}
          yAccessor={(p) => p.net}
          stroke={colours.ink}
          strokeWidth={2}
        />
        {lookahead.length > 0 && (
          <LineSeries
            dataKey="net grid exchange (lookahead)"
            data={lookahead}
            xAccessor={x}
            yAccessor={(p) => p.net}
            stroke={colours.inkSoft}
            strokeWidth={2}
            {...lookaheadLine}
          />
        )}
        {over.length > 0 && (
          <GlyphSeries
            dataKey="beyond a limit"
            data={over}
            xAccessor={x}
            yAccessor={(p) => p.net}
            colorAccessor={() => colours.brick}
            size={8}
          />
        )}
        <NearestTooltip<FlowPoint>
          render={({ datum: p }) =>
            'net' in p ? (
              <>
                {formatLocalTime(p.t, timeZone)} {p.step.delivery ? '' : '(lookahead)'}
                <br />
                grid {p.net >= 0 ? 'import' : 'export'} {formatNumber(Math.abs(p.net), 1)} kW
                {p.load !== null && ` · load ${formatNumber(p.load, 1)} kW`}
                {p.generation !== null && ` · generation ${formatNumber(p.generation, 1)} kW`}
              </>
            ) : null
          }
        />
      </ChartPlot>
    </ChartFigure>
  );
}
