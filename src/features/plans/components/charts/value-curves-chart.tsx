/** Stored-energy value against SoC at a few times (exact path only): where energy is worth more or less. */
import { Axis, LineSeries } from '@visx/xychart';
import type { PlanResults } from '@shared/schemas/plan';
import { ChartFigure, ChartPlot } from '@/components/charts/chart-frame';
import { seriesPalette as palette } from '@/components/charts/chart-theme';
import { formatLocalTime } from '@/lib/format';

export function ValueCurvesChart({
  curves,
  timeZone,
  currency,
}: {
  curves: PlanResults['valueCurves'];
  timeZone: string;
  currency: string;
}) {
  // At most four times, spread over the delivery window.
  const every = Math.max(1, Math.ceil(curves.length / 4));
  const shown = curves.filter((_, i) => i % every === 0).slice(0, 4);
  return (
    <ChartFigure
      caption="Value of stored energy against SoC"
      legend={shown.map((c, i) => ({ colour: palette[i]!, label: `at ${formatLocalTime(Date.parse(c.time), timeZone)}` }))}
    >
      <ChartPlot
        height={220}
        gridTicks={4}
        xScale={{ type: 'linear', domain: [0, 100] }}
        yScale={{ type: 'linear', nice: true, zero: false }}
        margin={{ bottom: 44 }}
        accessibilityLabel={`Stored-energy value in ${currency}/MWh against SoC in % at ${shown.length} times`}
      >
        <Axis orientation="bottom" numTicks={5} label="SoC %" />
        <Axis orientation="left" numTicks={4} label={`${currency}/MWh`} />
        {shown.map((curve, i) => (
          <LineSeries
            key={curve.time}
            dataKey={curve.time}
            data={curve.points}
            xAccessor={(p) => p.socPct}
            yAccessor={(p) => p.value}
            stroke={palette[i]}
            strokeWidth={2}
          />
        ))}
      </ChartPlot>
    </ChartFigure>
  );
}
