/**
 * Page layout shared by all charts: the title and subtitle block at the top, and the rectangle
 * left for the plot(s) and their decorations.
 */

import { textEl } from './svg.js';
import { fontSize, gap, ink } from './theme.js';
import { truncateToWidth, wrapText } from './text-metrics.js';

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface Header {
  elements: string[];
  /** y (px) just below the header. */
  bottom: number;
}

/**
 * Title (one line, bold) and subtitle (cautions, model notes; wrapped, at most `maxSubtitleLines`
 * lines, the last one ending in "…" when cut) across the top of a `width` px canvas.
 */
export function drawHeader(title: string, subtitle: string | readonly string[] | undefined, width: number, maxSubtitleLines = 4): Header {
  const elements: string[] = [];
  let y = gap.outer;
  const usable = width - 2 * gap.outer;
  if (title !== '') {
    y += fontSize.title;
    elements.push(
      // A long title (a long case name) is cut with "…" at the canvas width instead of running off it.
      textEl(truncateToWidth(title, fontSize.title * 1.08, usable), {
        x: width / 2,
        y,
        'font-size': fontSize.title,
        'font-weight': 'bold',
        'text-anchor': 'middle',
        fill: ink.text,
      }),
    );
  }
  const paragraphs = subtitle === undefined ? [] : typeof subtitle === 'string' ? [subtitle] : subtitle;
  // A word longer than the line (a long unbroken name) is cut too.
  let lines = paragraphs.flatMap((p) => wrapText(p, fontSize.subtitle, usable)).map((l) => truncateToWidth(l, fontSize.subtitle, usable));
  if (lines.length > maxSubtitleLines) {
    lines = lines.slice(0, maxSubtitleLines);
    lines[maxSubtitleLines - 1] = `${lines[maxSubtitleLines - 1] ?? ''} …`;
  }
  for (const line of lines) {
    y += fontSize.subtitle + 5;
    elements.push(textEl(line, { x: width / 2, y, 'font-size': fontSize.subtitle, 'text-anchor': 'middle', fill: ink.muted }));
  }
  return { elements, bottom: y + (elements.length > 0 ? 14 : 0) };
}
