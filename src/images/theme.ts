/**
 * Sizes and colours shared by every chart. Charts are laid out in CSS px for a 1200 x 750 canvas:
 * pasted 16 cm wide into a design note, 16 px text prints at about 6.5 pt, the smallest size
 * that stays legible after a photocopy (common practice, no source).
 */

export const defaultWidth = 1200;
export const defaultHeight = 750;

export const fontSize = {
  title: 24,
  subtitle: 16,
  axisLabel: 19,
  tick: 16,
  legend: 16,
  annotation: 15,
} as const;

export const ink = {
  text: '#1a1a1a',
  muted: '#555555',
  axis: '#333333',
  grid: '#e4e4e4',
  frame: '#333333',
  halo: '#ffffff',
  invalid: '#d9d9d9',
} as const;

export const stroke = {
  axis: 1.2,
  grid: 1,
  series: 2.5,
  reference: 3.2,
  contour: 1.3,
  edge: 4,
} as const;

/** Gaps in px. */
export const gap = {
  outer: 18,
  tickLength: 6,
  tickLabel: 8,
  axisLabel: 12,
  legendPad: 10,
  legendRow: 6,
} as const;
