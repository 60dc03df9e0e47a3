/**
 * Gap to the reference path and near-steady share against the horizon, one
 * line per terminal rule (default export: loaded lazily with the chart libraries).
 */
import { Axis, GlyphSeries, Grid, LineSeries, XYChart, buildChartTheme } from '@visx/xychart';
import type { StudyRun } from '@shared/schemas/study';

const palette = ['#13233f', '#2f9c81', '#e0961f', '#52698f'];
const theme = buildChartTheme({
  backgroundColor: '#ffffff',
  colors: palette,
  gridColor: '#e3e9f2',
  gridColorDark: '#a4b3cc',
  tickLength: 4,
  svgLabelSmall: { fill: '#2a4470', fontFamily: 'Barlow, sans-serif', fontSize: 11 },
  svgLabelBig: { fill: '#13233f', fontFamily: 'Barlow, sans-serif', fontSize: 12 },
});
const margin = { top: 12, right: 16, bottom: 40, left: 64 };

export interface StudyChartsProps {
  runs: StudyRun[];
  targetGapPct: number;
}

function ByHorizon({ runs, title, label, value, extra }: { runs: StudyRun[]; title: string; label: string; value: (r: StudyRun) => number | null; extra?: { y: number; text: string } }) {
  const rules = [...new Set(runs.map((r) => r.terminal))];
  const horizons = [...new Set(runs.map((r) => r.horizonHours))].sort((a, b) => a - b);
  return (
    <figure className="rounded bg-white p-2 shadow-sm">
      <figcaption className="px-2 text-sm font-medium text-ink-800">{title}</figcaption>
      {/* XYChart takes its width from its parent, which needs the height or the chart collapses onto what follows. */}
      <div style={{ height: 240 }}>
        <XYChart height={240} theme={theme} xScale={{ type: 'log', domain: [horizons[0] ?? 1, horizons.at(-1) ?? 2] }} yScale={{ type: 'linear', nice: true, zero: true }} margin={margin}
          accessibilityLabel={`${title}; the numbers are in the table of runs`}>
          <Grid columns={false} numTicks={4} />
          <Axis orientation="bottom" tickValues={horizons} tickFormat={(h: number) => `${h} h`} label="horizon" />
          <Axis orientation="left" numTicks={4} label={label} />
          {extra && (
            <LineSeries dataKey={extra.text} data={horizons.map((h) => ({ h }))} xAccessor={(d) => d.h} yAccessor={() => extra.y} stroke="#e0961f" strokeDasharray="4 3" />
          )}
          {rules.map((rule, i) => {
            const data = runs.filter((r) => r.terminal === rule && value(r) !== null).sort((a, b) => a.horizonHours - b.horizonHours);
            return [
              <LineSeries key={`${rule}-line`} dataKey={rule} data={data} xAccessor={(r) => r.horizonHours} yAccessor={value} stroke={palette[i % palette.length]} strokeWidth={2} />,
              <GlyphSeries key={`${rule}-dots`} dataKey={`${rule} runs`} data={data} xAccessor={(r) => r.horizonHours} yAccessor={value} colorAccessor={() => palette[i % palette.length]} size={7} />,
            ];
          })}
        </XYChart>
      </div>
      <ul className="flex flex-wrap gap-4 px-2 text-xs text-ink-700">
        {rules.map((rule, i) => (
          <li key={rule} className="flex items-center gap-1">
            <span className="inline-block h-1 w-4" style={{ background: palette[i % palette.length] }} /> {rule}
          </li>
        ))}
        {extra && <li className="text-amber-600">dashed: {extra.text}</li>}
      </ul>
    </figure>
  );
}

export default function StudyCharts({ runs, targetGapPct }: StudyChartsProps) {
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <ByHorizon runs={runs} title="Gap to the reference path against horizon" label="gap %" value={(r) => r.gapPct} extra={{ y: targetGapPct, text: `target ${targetGapPct} %` }} />
      <ByHorizon runs={runs} title="Near-steady share against horizon" label="share of steps %" value={(r) => r.nearSteadyShare * 100} />
    </div>
  );
}
