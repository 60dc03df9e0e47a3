/** SoC curves of several plans of one delivery window, overlaid (default export: loaded lazily). */
import { Axis, Grid, LineSeries, Tooltip, XYChart } from '@visx/xychart';
import type { Plan, PlanStep } from '@shared/schemas/plan';
import { formatNumber } from '@/lib/format';
import { chartMargin, chartTheme, colours } from './chart-theme';
import { timeTick } from './chart-data';
import { ChartLegend } from './soc-chart';

const palette = [colours.ink, colours.seaglass, colours.amber, colours.inkSoft, colours.brick, colours.seaglassSoft, colours.inkFaint];

export interface ComparisonChartProps {
  plans: Plan[];
  timeZone: string;
}

export default function ComparisonChart({ plans, timeZone }: ComparisonChartProps) {
  const label = (p: Plan) => `${p.horizonHours} h, ${p.terminalRule}`;
  return (
    <figure className="rounded bg-white p-2 shadow-sm">
      <figcaption className="px-2 text-sm font-medium text-ink-800">SoC over the delivery window, by horizon and terminal rule</figcaption>
      {/* XYChart takes its width from its parent, which needs the height or the chart collapses onto what follows. */}
      <div style={{ height: 280 }}>
        <XYChart height={280} theme={chartTheme} xScale={{ type: 'time' }} yScale={{ type: 'linear', domain: [0, 100] }} margin={chartMargin}
          accessibilityLabel="SoC curves of the compared plans; the figures are in the table above">
          <Grid columns={false} numTicks={5} />
          <Axis orientation="bottom" numTicks={6} tickFormat={timeTick(timeZone)} />
          <Axis orientation="left" numTicks={5} label="SoC %" />
          {plans.map((p, i) => (
            <LineSeries key={p.id} dataKey={label(p)} data={p.results!.steps.slice(0, p.results!.deliverySteps)}
              xAccessor={(s: PlanStep) => new Date(Date.parse(s.time) + p.results!.stepMinutes * 60_000)} yAccessor={(s: PlanStep) => s.socPct} stroke={palette[i % palette.length]} strokeWidth={2}
              strokeDasharray={p.terminalRule === 'free' ? '6 3' : undefined} />
          ))}
          <Tooltip<PlanStep> showVerticalCrosshair renderTooltip={({ tooltipData }) => (
            <span className="text-xs">
              {Object.entries(tooltipData?.datumByKey ?? {}).map(([key, d]) => (
                <span key={key} className="block">{key}: {formatNumber(d.datum.socPct, 1)} %</span>
              ))}
            </span>
          )} />
        </XYChart>
      </div>
      <ChartLegend items={plans.map((p, i) => ({ colour: palette[i % palette.length]!, label: label(p), dashed: p.terminalRule === 'free' }))} />
    </figure>
  );
}
