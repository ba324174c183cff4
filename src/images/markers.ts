/**
 * Point markers that survive black-and-white printing: distinct shapes, alternately filled and
 * open, each drawn centred on (x, y) with `size` px across.
 */

import { el, fmt } from './svg.js';

export type MarkerShape = 'none' | 'circle' | 'square' | 'triangle' | 'diamond' | 'triangle-down' | 'cross' | 'plus';

/** Path data of a marker outline. */
export function markerPathData(shape: Exclude<MarkerShape, 'none'>, x: number, y: number, size: number): string {
  const r = size / 2;
  switch (shape) {
    case 'circle':
      return `M${fmt(x - r)} ${fmt(y)}a${fmt(r)} ${fmt(r)} 0 1 0 ${fmt(2 * r)} 0a${fmt(r)} ${fmt(r)} 0 1 0 ${fmt(-2 * r)} 0Z`;
    case 'square': {
      const h = r * 0.88;
      return `M${fmt(x - h)} ${fmt(y - h)}H${fmt(x + h)}V${fmt(y + h)}H${fmt(x - h)}Z`;
    }
    case 'triangle':
      return `M${fmt(x)} ${fmt(y - r * 1.1)}L${fmt(x + r)} ${fmt(y + r * 0.75)}L${fmt(x - r)} ${fmt(y + r * 0.75)}Z`;
    case 'triangle-down':
      return `M${fmt(x)} ${fmt(y + r * 1.1)}L${fmt(x + r)} ${fmt(y - r * 0.75)}L${fmt(x - r)} ${fmt(y - r * 0.75)}Z`;
    case 'diamond':
      return `M${fmt(x)} ${fmt(y - r * 1.15)}L${fmt(x + r * 0.9)} ${fmt(y)}L${fmt(x)} ${fmt(y + r * 1.15)}L${fmt(x - r * 0.9)} ${fmt(y)}Z`;
    case 'cross': {
      const h = r * 0.8;
      return `M${fmt(x - h)} ${fmt(y - h)}L${fmt(x + h)} ${fmt(y + h)}M${fmt(x + h)} ${fmt(y - h)}L${fmt(x - h)} ${fmt(y + h)}`;
    }
    case 'plus':
      return `M${fmt(x - r)} ${fmt(y)}H${fmt(x + r)}M${fmt(x)} ${fmt(y - r)}V${fmt(y + r)}`;
    default: {
      const unreachable: never = shape;
      throw new Error(`unknown marker ${String(unreachable)}`);
    }
  }
}

/** A marker element; open markers are filled white so lines behind them do not show through. */
export function markerElement(shape: MarkerShape, x: number, y: number, size: number, colour: string, filled: boolean): string {
  if (shape === 'none') return '';
  const lineOnly = shape === 'cross' || shape === 'plus';
  return el('path', {
    d: markerPathData(shape, x, y, size),
    fill: lineOnly ? 'none' : filled ? colour : '#ffffff',
    stroke: colour,
    'stroke-width': lineOnly ? 2.2 : 1.8,
    'stroke-linejoin': 'miter',
  });
}
