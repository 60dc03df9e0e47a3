/**
 * The preview's SoC over the plan's: the plan in ink, the preview in sea-glass,
 * each lookahead dashed. Loaded on first use, like the plan's charts.
 */
import { Axis, LineSeries } from '@visx/xychart';
import type { HorizonPreview } from '@shared/schemas/horizon-preview';
import type { PlanResults } from '@shared/schemas/plan';
import { ChartFigure, ChartPlot } from '@/components/charts/chart-frame';
import { colours, lookaheadLine } from '@/components/charts/chart-theme';
import { NearestTooltip } from '@/components/charts/chart-tooltip';
import { TimeAxis } from '@/components/charts/time-axis';
import { formatLocalTime, formatNumber } from '@/lib/format';
import { extentOf } from '../charts/chart-data';
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
  const extent = extentOf([...plan.delivery, ...plan.lookahead, ...other.delivery, ...other.lookahead], (p) => p.tEnd);
  return (
    <ChartFigure
      caption="SoC of the plan and of the preview"
      legend={[
        { colour: colours.ink, label: `SoC, ${planLabel} (lookahead dashed)` },
        { colour: colours.seaglass, label: `SoC, ${previewLabel} (lookahead dashed)` },
      ]}
    >
      <ChartPlot
        height={260}
        gridTicks={5}
        xScale={{ type: 'time' }}
        yScale={{ type: 'linear', domain: [0, 100] }}
        accessibilityLabel="SoC in % of the plan and of the preview; the numbers are in the table below the chart"
      >
        <TimeAxis timeZone={timeZone} {...extent} />
        <Axis orientation="left" numTicks={5} label="SoC %" />
        <LineSeries dataKey={planLabel} data={plan.delivery} xAccessor={x} yAccessor={y} stroke={colours.ink} strokeWidth={2} />
        {plan.lookahead.length > 0 && (
          <LineSeries
            dataKey={`${planLabel} (lookahead)`}
            data={plan.lookahead}
            xAccessor={x}
            yAccessor={y}
            stroke={colours.ink}
            strokeWidth={2}
            {...lookaheadLine}
          />
        )}
        <LineSeries
          dataKey={previewLabel}
          data={other.delivery}
          xAccessor={x}
          yAccessor={y}
          stroke={colours.seaglass}
          strokeWidth={2.5}
        />
        {other.lookahead.length > 0 && (
          <LineSeries
            dataKey={`${previewLabel} (lookahead)`}
            data={other.lookahead}
            xAccessor={x}
            yAccessor={y}
            stroke={colours.seaglass}
            strokeWidth={2.5}
            {...lookaheadLine}
          />
        )}
        <NearestTooltip<SocPoint>
          render={({ datum, key }) => (
            <>
              end of step {formatLocalTime(datum.tEnd, timeZone)}
              <br />
              {key}: SoC {formatNumber(datum.socPct, 1)} %
            </>
          )}
        />
      </ChartPlot>
    </ChartFigure>
  );
}
