/**
 * Slackwater's chart look: ink structure, sea-glass battery and steady cycle, amber only
 * for warnings and the leaving arc, brick red only for violations (never an ordinary series).
 */
import { buildChartTheme } from '@visx/xychart';

export const colours = {
  ink: '#13233f',
  inkSoft: '#52698f',
  inkFaint: '#a4b3cc',
  seaglass: '#2f9c81',
  seaglassSoft: '#98dcc6',
  seaglassBand: '#dcf4ec',
  /** Further cool series colours, for lines told apart by colour (plans, curves, site flows). */
  harbour: '#2e6ca8',
  heather: '#7656a0',
  tide: '#2a8aa3',
  slate: '#6b7a90',
  /** Reserved: warnings and the leaving arc. */
  amber: '#e0961f',
  /** Reserved: violations. */
  brick: '#b23a26',
};

/**
 * Lines told apart by colour (one per plan, curve or rule), in the order they are handed out.
 * Amber and brick are not among them: they keep their meaning (warning, violation).
 */
export const seriesPalette = [
  colours.ink,
  colours.harbour,
  colours.seaglass,
  colours.heather,
  colours.tide,
  colours.slate,
  colours.inkSoft,
  colours.seaglassSoft,
];

/**
 * The shared look with another set of default series colours: a series drawn
 * without its own stroke takes the next of these, in the order of its dataKey.
 */
export function chartThemeWith(seriesColours: string[]) {
  return buildChartTheme({
    backgroundColor: '#ffffff',
    colors: seriesColours,
    gridColor: '#e3e9f2',
    gridColorDark: colours.inkFaint,
    tickLength: 4,
    svgLabelSmall: { fill: '#2a4470', fontFamily: 'Barlow, sans-serif', fontSize: 11 },
    svgLabelBig: { fill: colours.ink, fontFamily: 'Barlow, sans-serif', fontSize: 12 },
  });
}

export const chartTheme = chartThemeWith([colours.ink, colours.seaglass, colours.harbour]);

/** Room below for two-line time labels (time, then the date where the day changes); to the right for the last label. */
export const chartMargin = { top: 12, right: 24, bottom: 40, left: 64 };

/** The lookahead is drawn dashed and faded, apart from the delivery window. */
export const lookaheadLine = { strokeDasharray: '5 4', strokeOpacity: 0.6 };
