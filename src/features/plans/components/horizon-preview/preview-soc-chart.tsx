/**
 * The preview's SoC over the plan's: the plan in ink, the preview in sea-glass,
 * each lookahead dashed. Loaded on first use, like the plan's charts.
 */
import { Axis, Grid, LineSeries, Tooltip, XYChart } from '@visx/xychart';
import type { HorizonPreview } from '@shared/schemas/horizon-preview';
import type { PlanResults } from '@shared/schemas/plan';
import { formatLocalTime, formatNumber } from '@/lib/format';
import { chartMargin, chartTheme, colours, lookaheadLine } from '../charts/chart-theme';
import { timeTick } from '../charts/chart-data';
import { ChartLegend } from '../charts/soc-chart';
import { planSocLine, previewSocLine, type SocPoint } from './preview-series';

const x = (p: SocPoint) => new Date(p.tEnd);
const y = (p: SocPoint) => p.socPct;

export interface PreviewSocChartProps {
  results: PlanResults;
  planHorizonHours: number;
  preview: HorizonPreview;
  timeZone: string;
}

export default function PreviewSocChart({ results, planHorizonHours, preview, timeZone }: PreviewSocChartProps) {
  const plan = planSocLine(results);
  const other = previewSocLine(preview);
  const planLabel = `plan, ${formatNumber(planHorizonHours, 2)} h`;
  const previewLabel = `preview, ${formatNumber(preview.horizonHours, 2)} h`;
  return (
    <figure className="rounded bg-white p-2 shadow-sm">
      <figcaption className="px-2 text-sm font-medium text-ink-800">SoC of the plan and of the preview</figcaption>
      {/* XYChart takes its width from its parent, which needs the height or the chart collapses onto what follows. */}
      <div style={{ height: 260 }}>
        <XYChart height={260} theme={chartTheme} xScale={{ type: 'time' }} yScale={{ type: 'linear', domain: [0, 100] }} margin={chartMargin}
          accessibilityLabel="SoC in % of the plan and of the preview; the numbers are in the table below the chart">
          <Grid columns={false} numTicks={5} />
          <Axis orientation="bottom" numTicks={6} tickFormat={timeTick(timeZone)} />
          <Axis orientation="left" numTicks={5} label="SoC %" />
          <LineSeries dataKey={planLabel} data={plan.delivery} xAccessor={x} yAccessor={y} stroke={colours.ink} strokeWidth={2} />
          {plan.lookahead.length > 0 && (
            <LineSeries dataKey={`${planLabel} (lookahead)`} data={plan.lookahead} xAccessor={x} yAccessor={y} stroke={colours.ink} strokeWidth={2} {...lookaheadLine} />
          )}
          <LineSeries dataKey={previewLabel} data={other.delivery} xAccessor={x} yAccessor={y} stroke={colours.seaglass} strokeWidth={2.5} />
          {other.lookahead.length > 0 && (
            <LineSeries dataKey={`${previewLabel} (lookahead)`} data={other.lookahead} xAccessor={x} yAccessor={y} stroke={colours.seaglass} strokeWidth={2.5} {...lookaheadLine} />
          )}
          <Tooltip<SocPoint>
            snapTooltipToDatumX
            showVerticalCrosshair
            renderTooltip={({ tooltipData }) => {
              const p = tooltipData?.nearestDatum;
              return p ? (
                <span className="text-xs">
                  end of step {formatLocalTime(p.datum.tEnd, timeZone)}
                  <br />
                  {p.key}: SoC {formatNumber(p.datum.socPct, 1)} %
                </span>
              ) : null;
            }}
          />
        </XYChart>
      </div>
      <ChartLegend
        items={[
          { colour: colours.ink, label: `SoC, ${planLabel} (lookahead dashed)` },
          { colour: colours.seaglass, label: `SoC, ${previewLabel} (lookahead dashed)` },
        ]}
      />
    </figure>
  );
}
