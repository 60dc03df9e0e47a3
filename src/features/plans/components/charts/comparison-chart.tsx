/**
 * SoC curves of several plans of one delivery window, overlaid (default export: loaded lazily).
 * Colour tells the horizon and the dash the terminal rule, so ten plans stay apart; pointing at
 * a line or its legend entry (or focusing the entry) brings that plan forward and fades the rest,
 * and pressing the entry keeps it so.
 */
import { useContext, useEffect, useState } from 'react';
import { Axis, LineSeries, Tooltip, TooltipContext } from '@visx/xychart';
import type { Plan, PlanStep } from '@shared/schemas/plan';
import { ChartFigure, ChartPlot } from '@/components/charts/chart-frame';
import { seriesPalette as palette } from '@/components/charts/chart-theme';
import { TimeAxis } from '@/components/charts/time-axis';
import { formatNumber } from '@/lib/format';
import { planLabels } from '../comparison-labels';

export interface ComparisonChartProps {
  plans: Plan[];
  timeZone: string;
}

const RULE_DASH: Record<string, string | undefined> = { 'steady-value': undefined, free: '7 4', cyclic: '2 3' };
const dashOf = (rule: string) => (rule in RULE_DASH ? RULE_DASH[rule] : '8 3 2 3');

interface Series {
  plan: Plan;
  label: string;
  colour: string;
  dash: string | undefined;
  steps: PlanStep[];
}

function seriesOf(plans: Plan[]): Series[] {
  const labels = planLabels(plans);
  const horizons = [...new Set(plans.map((p) => p.horizonHours))].sort((a, b) => a - b);
  return plans.map((plan, i) => ({
    plan,
    label: labels[i]!,
    colour: palette[horizons.indexOf(plan.horizonHours) % palette.length]!,
    dash: dashOf(plan.terminalRule),
    steps: plan.results!.steps.slice(0, plan.results!.deliverySteps),
  }));
}

const endOf = (plan: Plan, s: PlanStep) => Date.parse(s.time) + plan.results!.stepMinutes * 60_000;

/** Reports the line nearest the pointer (inside the chart, where the tooltip knows it). */
function NearestLine({ onNearest }: { onNearest: (key: string | null) => void }) {
  const tooltip = useContext(TooltipContext);
  const key = tooltip?.tooltipOpen ? (tooltip.tooltipData?.nearestDatum?.key ?? null) : null;
  useEffect(() => onNearest(key), [key, onNearest]);
  return null;
}

export default function ComparisonChart({ plans, timeZone }: ComparisonChartProps) {
  const series = seriesOf(plans);
  const [pinned, setPinned] = useState<string | null>(null);
  const [pointed, setPointed] = useState<string | null>(null);
  const [nearest, setNearest] = useState<string | null>(null);
  const active = pointed ?? pinned ?? nearest;
  // The active line is drawn last, over the others.
  const ordered = [...series].sort((a, b) => Number(a.label === active) - Number(b.label === active));
  const all = series.flatMap((s) => s.steps.map((step) => endOf(s.plan, step)));
  return (
    <ChartFigure caption="SoC over the delivery window, by horizon (colour) and terminal rule (dash)">
      <ChartPlot
        height={300}
        gridTicks={5}
        xScale={{ type: 'time' }}
        yScale={{ type: 'linear', domain: [0, 100] }}
        accessibilityLabel="SoC curves of the compared plans; the figures are in the table above"
      >
        <TimeAxis timeZone={timeZone} startMs={Math.min(...all)} endMs={Math.max(...all)} />
        <Axis orientation="left" numTicks={5} label="SoC %" />
        {ordered.map((s) => (
          <LineSeries
            key={s.plan.id}
            dataKey={s.label}
            data={s.steps}
            xAccessor={(step: PlanStep) => new Date(endOf(s.plan, step))}
            yAccessor={(step: PlanStep) => step.socPct}
            stroke={s.colour}
            strokeWidth={s.label === active ? 3 : 1.75}
            strokeOpacity={active === null || s.label === active ? 1 : 0.18}
            strokeDasharray={s.dash}
          />
        ))}
        <NearestLine onNearest={setNearest} />
        {/* Every plan's SoC at the pointer's time, highest first; the line pointed at in bold. */}
        <Tooltip<PlanStep>
          showVerticalCrosshair
          renderTooltip={({ tooltipData }) => (
            <span className="text-xs">
              {Object.entries(tooltipData?.datumByKey ?? {})
                .sort(([, a], [, b]) => b.datum.socPct - a.datum.socPct)
                .map(([key, d]) => (
                  <span key={key} className={`block ${key === tooltipData?.nearestDatum?.key ? 'font-semibold' : ''}`}>
                    {key}: {formatNumber(d.datum.socPct, 1)} %
                  </span>
                ))}
            </span>
          )}
        />
      </ChartPlot>
      <ul className="flex flex-wrap gap-1 px-1 pt-1 text-xs text-ink-700" aria-label="Plans in the chart">
        {series.map((s) => (
          <li key={s.plan.id}>
            <button
              type="button"
              aria-pressed={pinned === s.label}
              onClick={() => setPinned((p) => (p === s.label ? null : s.label))}
              onPointerEnter={() => setPointed(s.label)}
              onPointerLeave={() => setPointed(null)}
              onFocus={() => setPointed(s.label)}
              onBlur={() => setPointed(null)}
              className={`flex items-center gap-1.5 rounded border px-1.5 py-0.5 ${pinned === s.label ? 'border-ink-700 bg-ink-100' : 'border-transparent hover:bg-ink-50'}`}
            >
              <svg width="22" height="6" aria-hidden="true">
                <line x1="0" y1="3" x2="22" y2="3" stroke={s.colour} strokeWidth="3" strokeDasharray={s.dash} />
              </svg>
              {s.label}
            </button>
          </li>
        ))}
      </ul>
      <p className="px-2 pt-1 text-xs text-ink-500">
        Point at a line or a plan above to bring it forward; press a plan to keep it highlighted.
      </p>
    </ChartFigure>
  );
}
