/** Slackwater's chart look: ink structure, sea-glass battery and steady cycle, amber leaving arc. */
import { buildChartTheme } from '@visx/xychart';

export const colours = {
  ink: '#13233f',
  inkSoft: '#52698f',
  inkFaint: '#a4b3cc',
  seaglass: '#2f9c81',
  seaglassSoft: '#98dcc6',
  seaglassBand: '#dcf4ec',
  amber: '#e0961f',
  brick: '#b23a26',
};

/** Lines told apart by colour alone (one per plan, curve or rule), in the order they are handed out. */
export const seriesPalette = [
  colours.ink,
  colours.seaglass,
  colours.amber,
  colours.inkSoft,
  colours.brick,
  colours.seaglassSoft,
  colours.inkFaint,
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

export const chartTheme = chartThemeWith([colours.ink, colours.seaglass, colours.amber]);

export const chartMargin = { top: 12, right: 16, bottom: 32, left: 64 };

/** The lookahead is drawn dashed and faded, apart from the delivery window. */
export const lookaheadLine = { strokeDasharray: '5 4', strokeOpacity: 0.6 };
