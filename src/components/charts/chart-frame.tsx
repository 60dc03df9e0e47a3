/**
 * The frame every Slackwater chart shares: a white card with its caption and
 * legend (ChartFigure) around one or more XYCharts drawn at a fixed height in
 * the shared look (ChartPlot).
 */
import type { ReactNode } from 'react';
import { Grid, XYChart, type Margin, type XYChartTheme } from '@visx/xychart';
import { chartMargin, chartTheme } from './chart-theme';

export interface LegendItem {
  colour: string;
  label: string;
  dashed?: boolean;
}

interface ChartFigureProps {
  /** Also the figure's accessible name. */
  caption: ReactNode;
  /** For screen readers only, when the page around the chart already titles it. */
  hideCaption?: boolean;
  legend?: LegendItem[];
  /** Added to the card's classes. */
  className?: string;
  children: ReactNode;
}

export function ChartFigure({ caption, hideCaption = false, legend, className, children }: ChartFigureProps) {
  return (
    <figure className={`${className ? `${className} ` : ''}rounded bg-white p-2 shadow-sm`}>
      <figcaption className={hideCaption ? 'sr-only' : 'px-2 text-sm font-medium text-ink-800'}>{caption}</figcaption>
      {children}
      {legend && <ChartLegend items={legend} />}
    </figure>
  );
}

type XYChartProps = Parameters<typeof XYChart>[0];

interface ChartPlotProps extends Pick<XYChartProps, 'xScale' | 'yScale' | 'accessibilityLabel' | 'children'> {
  /** In px, the whole chart with its axes. */
  height: number;
  /** Horizontal grid lines only; usually the left axis's tick count. */
  gridTicks: number;
  /** Sides that differ from the shared margin, e.g. room for a bottom axis label. */
  margin?: Partial<Margin>;
  theme?: XYChartTheme;
}

export function ChartPlot({ height, gridTicks, margin, theme = chartTheme, children, ...rest }: ChartPlotProps) {
  return (
    // XYChart takes its width from its parent, which needs the height or the chart collapses onto what follows.
    <div style={{ height }}>
      <XYChart height={height} theme={theme} margin={{ ...chartMargin, ...margin }} {...rest}>
        <Grid columns={false} numTicks={gridTicks} />
        {children}
      </XYChart>
    </div>
  );
}

export function ChartLegend({ items }: { items: LegendItem[] }) {
  return (
    <ul className="flex flex-wrap gap-x-4 gap-y-1 px-2 pt-1 text-xs text-ink-700">
      {items.map((item) => (
        <li key={item.label} className="flex items-center gap-1.5">
          <svg width="18" height="6" aria-hidden="true">
            <line
              x1="0"
              y1="3"
              x2="18"
              y2="3"
              stroke={item.colour}
              strokeWidth="3"
              strokeDasharray={item.dashed ? '4 3' : undefined}
            />
          </svg>
          {item.label}
        </li>
      ))}
    </ul>
  );
}
