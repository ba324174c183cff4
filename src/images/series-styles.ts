/**
 * Line styles for many series on one chart, readable in colour, for colour-blind readers and on
 * a black-and-white print: each series differs in colour, dash pattern and marker shape at once.
 *
 * Colours: the Okabe-Ito palette (M. Okabe & K. Ito (2008), "Color Universal Design (CUD): how to
 * make figures and presentations that are friendly to colorblind people"), black first for the
 * reference, without its yellow (too light on white paper).
 */

import type { MarkerShape } from './markers.js';

export type LineStyle = 'solid' | 'dashed' | 'dotted' | 'dashdot' | 'longdash' | 'dashdotdot';

export const okabeItoColours: readonly string[] = [
  '#000000', // black
  '#0072B2', // blue
  '#D55E00', // vermillion
  '#009E73', // bluish green
  '#CC79A7', // reddish purple
  '#E69F00', // orange
  '#56B4E9', // sky blue
];

const styleOrder: readonly LineStyle[] = ['solid', 'dashed', 'dotted', 'dashdot', 'longdash', 'dashdotdot'];
const markerOrder: readonly MarkerShape[] = ['none', 'circle', 'square', 'triangle', 'diamond', 'triangle-down', 'cross', 'plus'];

/** SVG stroke-dasharray for a style (px), or undefined for a solid line. */
export function dashArray(style: LineStyle): string | undefined {
  switch (style) {
    case 'solid':
      return undefined;
    case 'dashed':
      return '11 6';
    case 'dotted':
      return '2.5 5';
    case 'dashdot':
      return '13 5 2.5 5';
    case 'longdash':
      return '24 7';
    case 'dashdotdot':
      return '13 5 2.5 5 2.5 5';
    default: {
      const unreachable: never = style;
      throw new Error(`unknown line style ${String(unreachable)}`);
    }
  }
}

export interface ResolvedStyle {
  colour: string;
  style: LineStyle;
  marker: MarkerShape;
  markerFilled: boolean;
}

/** The default look of the series with this index (index 0 = the reference: black, solid, no marker). */
export function defaultSeriesStyle(index: number): ResolvedStyle {
  const k = ((index % styleOrder.length) + styleOrder.length) % styleOrder.length;
  return {
    colour: okabeItoColours[index % okabeItoColours.length] ?? '#000000',
    style: styleOrder[k] ?? 'solid',
    marker: index === 0 ? 'none' : (markerOrder[1 + ((index - 1) % (markerOrder.length - 1))] ?? 'circle'),
    markerFilled: index % 2 === 1,
  };
}
