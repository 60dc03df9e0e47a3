/**
 * Gap to the reference path and near-steady share against the horizon, one
 * line per terminal rule (default export: loaded lazily with the chart libraries).
 */
import { Axis, GlyphSeries, LineSeries } from '@visx/xychart';
import type { StudyRun } from '@shared/schemas/study';
import { ChartFigure, ChartPlot } from '@/components/charts/chart-frame';
import { chartThemeWith, colours, seriesPalette } from '@/components/charts/chart-theme';

// One colour per terminal rule (a study has at most four), also the theme's series colours.
const palette = seriesPalette.slice(0, 4);
const theme = chartThemeWith(palette);

export interface StudyChartsProps {
  runs: StudyRun[];
  targetGapPct: number;
}

function ByHorizon({
  runs,
  title,
  label,
  value,
  extra,
}: {
  runs: StudyRun[];
  title: string;
  label: string;
  value: (r: StudyRun) => number | null;
  extra?: { y: number; text: string };
}) {
  const rules = [...new Set(runs.map((r) => r.terminal))];
  const horizons = [...new Set(runs.map((r) => r.horizonHours))].sort((a, b) => a - b);
  return (
    <ChartFigure caption={title}>
      {/* Taller bottom margin: room for the "horizon" axis label. */}
      <ChartPlot
        height={240}
        gridTicks={4}
        theme={theme}
        xScale={{ type: 'log', domain: [horizons[0] ?? 1, horizons.at(-1) ?? 2] }}
        yScale={{ type: 'linear', nice: true, zero: true }}
        margin={{ bottom: 40 }}
        accessibilityLabel={`${title}; the numbers are in the table of runs`}
      >
        <Axis orientation="bottom" tickValues={horizons} tickFormat={(h: number) => `${h} h`} label="horizon" />
        <Axis orientation="left" numTicks={4} label={label} />
        {extra && (
          <LineSeries
            dataKey={extra.text}
            data={horizons.map((h) => ({ h }))}
            xAccessor={(d) => d.h}
            yAccessor={() => extra.y}
            stroke={colours.inkSoft}
            strokeDasharray="4 3"
          />
        )}
        {rules.map((rule, i) => {
          const data = runs
            .filter((r) => r.terminal === rule && value(r) !== null)
            .sort((a, b) => a.horizonHours - b.horizonHours);
          return [
            <LineSeries
              key={`${rule}-line`}
              dataKey={rule}
              data={data}
              xAccessor={(r) => r.horizonHours}
              yAccessor={value}
              stroke={palette[i % palette.length]}
              strokeWidth={2}
            />,
            <GlyphSeries
              key={`${rule}-dots`}
              dataKey={`${rule} runs`}
              data={data}
              xAccessor={(r) => r.horizonHours}
              yAccessor={value}
              colorAccessor={() => palette[i % palette.length]}
              size={7}
            />,
          ];
        })}
      </ChartPlot>
      <ul className="flex flex-wrap gap-4 px-2 text-xs text-ink-700">
        {rules.map((rule, i) => (
          <li key={rule} className="flex items-center gap-1">
            <span className="inline-block h-1 w-4" style={{ background: palette[i % palette.length] }} /> {rule}
          </li>
        ))}
        {extra && (
          <li className="flex items-center gap-1">
            <svg width="18" height="6" aria-hidden="true">
              <line x1="0" y1="3" x2="18" y2="3" stroke={colours.inkSoft} strokeWidth="2" strokeDasharray="4 3" />
            </svg>
            {extra.text}
          </li>
        )}
      </ul>
    </ChartFigure>
  );
}

export default function StudyCharts({ runs, targetGapPct }: StudyChartsProps) {
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <ByHorizon
        runs={runs}
        title="Gap to the reference path against horizon"
        label="gap %"
        value={(r) => r.gapPct}
        extra={{ y: targetGapPct, text: `target ${targetGapPct} %` }}
      />
      <ByHorizon
        runs={runs}
        title="Near-steady share against horizon"
        label="share of steps %"
        value={(r) => r.nearSteadyShare * 100}
      />
    </div>
  );
}
