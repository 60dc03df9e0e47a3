/**
 * The frame every Slackwater chart shares: a white card with its caption and
 * legend (ChartFigure) around one or more XYCharts drawn at a fixed height in
 * the shared look (ChartPlot).
 */
import { createContext, useContext, useLayoutEffect, useRef, useState, type ReactNode } from 'react';
import { Grid, XYChart, type Margin, type XYChartTheme } from '@visx/xychart';
import { chartMargin, chartTheme } from './chart-theme';

/** The plot being rendered: its whole width and the x where drawing starts and ends (px), for axes that fit their ticks. */
export interface PlotBox {
  width: number;
  left: number;
  right: number;
}
const PlotBoxContext = createContext<PlotBox>({ width: 600, left: chartMargin.left, right: 600 - chartMargin.right });
export const usePlotBox = () => useContext(PlotBoxContext);

/** The element's content width, kept up to date; 0 until measured. */
function useWidth() {
  const ref = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(0);
  useLayoutEffect(() => {
    const box = ref.current;
    if (!box) return;
    setWidth(box.clientWidth);
    const observer = new ResizeObserver(([entry]) => setWidth(Math.floor(entry?.contentRect.width ?? 0)));
    observer.observe(box);
    return () => observer.disconnect();
  }, []);
  return { ref, width };
}

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
  const { ref, width } = useWidth();
  const sides = { ...chartMargin, ...margin };
  const inner = width - sides.left - sides.right;
  return (
    // The box keeps the chart's height while it is measured, or the chart collapses onto what follows.
    <div ref={ref} style={{ height }} className="min-w-0">
      {/* Drawn once there is room for the plot: a width below the margins would give its rectangles negative sizes. */}
      {inner > 20 && (
        <PlotBoxContext.Provider value={{ width, left: sides.left, right: width - sides.right }}>
          <XYChart width={width} height={height} theme={theme} margin={sides} {...rest}>
            <Grid columns={false} numTicks={gridTicks} />
            {children}
          </XYChart>
        </PlotBoxContext.Provider>
      )}
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
