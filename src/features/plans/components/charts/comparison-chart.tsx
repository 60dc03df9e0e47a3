/** SoC curves of several plans of one delivery window, overlaid (default export: loaded lazily). */
import { Axis, LineSeries, Tooltip } from '@visx/xychart';
import type { Plan, PlanStep } from '@shared/schemas/plan';
import { ChartFigure, ChartPlot } from '@/components/charts/chart-frame';
import { seriesPalette as palette } from '@/components/charts/chart-theme';
import { formatNumber } from '@/lib/format';
import { timeTick } from './chart-data';
import { planLabels } from '../comparison-labels';

export interface ComparisonChartProps {
  plans: Plan[];
  timeZone: string;
}

export default function ComparisonChart({ plans, timeZone }: ComparisonChartProps) {
  const labels = planLabels(plans);
  return (
    <ChartFigure
      caption="SoC over the delivery window, by horizon and terminal rule"
      legend={plans.map((p, i) => ({
        colour: palette[i % palette.length]!,
        label: labels[i]!,
        dashed: p.terminalRule === 'free',
      }))}
    >
      <ChartPlot
        height={280}
        gridTicks={5}
        xScale={{ type: 'time' }}
        yScale={{ type: 'linear', domain: [0, 100] }}
        accessibilityLabel="SoC curves of the compared plans; the figures are in the table above"
      >
        <Axis orientation="bottom" numTicks={6} tickFormat={timeTick(timeZone)} />
        <Axis orientation="left" numTicks={5} label="SoC %" />
        {plans.map((p, i) => (
          <LineSeries
            key={p.id}
            dataKey={labels[i]!}
            data={p.results!.steps.slice(0, p.results!.deliverySteps)}
            xAccessor={(s: PlanStep) => new Date(Date.parse(s.time) + p.results!.stepMinutes * 60_000)}
            yAccessor={(s: PlanStep) => s.socPct}
            stroke={palette[i % palette.length]}
            strokeWidth={2}
            strokeDasharray={p.terminalRule === 'free' ? '6 3' : undefined}
          />
        ))}
        {/* Every plan's SoC at the pointer's time, not only the nearest line's. */}
        <Tooltip<PlanStep>
          showVerticalCrosshair
          renderTooltip={({ tooltipData }) => (
            <span className="text-xs">
              {Object.entries(tooltipData?.datumByKey ?? {}).map(([key, d]) => (
                <span key={key} className="block">
                  {key}: {formatNumber(d.datum.socPct, 1)} %
                </span>
              ))}
            </span>
          )}
        />
      </ChartPlot>
    </ChartFigure>
  );
}
