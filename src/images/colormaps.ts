/**
 * Colour maps: value in [0, 1] -> sRGB colour.
 *
 * Sequential, perceptually uniform (for temperature fields):
 *   viridis  van der Walt & Smith (2015), matplotlib's default map; 256-entry published table.
 *   cividis  Nuñez, Anderton & Renslow (2018), PLOS ONE 13(7): e0199239; optimised for colour-vision deficiency.
 * Diverging, colour-blind safe, neutral at the centre (for signed quantities such as drift):
 *   rdbu     Brewer (2003), ColorBrewer RdBu 11-class: red (low) - near white - blue (high).
 *   puor     Brewer (2003), ColorBrewer PuOr 11-class: orange (low) - near white - purple (high).
 * Tables: colormap-tables.ts. Between tabulated entries the colour is interpolated linearly in sRGB,
 * which is how matplotlib builds its continuous maps from the same lists.
 */

import { brewerPuOrHex, brewerRdBuHex, cividisTable, viridisTable } from './colormap-tables.js';

export type ColormapName = 'viridis' | 'cividis' | 'rdbu' | 'puor';
export type ColormapKind = 'sequential' | 'diverging';

export interface Colormap {
  name: ColormapName;
  kind: ColormapKind;
  /** Whether the published order was reversed (low end <-> high end). */
  reversed: boolean;
  /** Anchor colours, r, g, b in 0..1, from the low end (t = 0) to the high end (t = 1). */
  anchors: Float64Array;
  /** Where the table comes from. */
  source: string;
}

function hexToUnitRgb(hex: string): [number, number, number] {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new Error(`colormaps: bad hex colour ${hex}`);
  return [parseInt(m[1] ?? '0', 16) / 255, parseInt(m[2] ?? '0', 16) / 255, parseInt(m[3] ?? '0', 16) / 255];
}

function fromHexList(list: readonly string[]): number[] {
  return list.flatMap(hexToUnitRgb);
}

function publishedAnchors(name: ColormapName): { kind: ColormapKind; table: readonly number[]; source: string } {
  switch (name) {
    case 'viridis':
      return { kind: 'sequential', table: viridisTable, source: 'viridis: van der Walt & Smith (2015), matplotlib' };
    case 'cividis':
      return {
        kind: 'sequential',
        table: cividisTable,
        source: 'cividis: Nuñez, Anderton & Renslow (2018), PLOS ONE 13(7): e0199239',
      };
    case 'rdbu':
      return { kind: 'diverging', table: fromHexList(brewerRdBuHex), source: 'RdBu: Brewer (2003), ColorBrewer' };
    case 'puor':
      return { kind: 'diverging', table: fromHexList(brewerPuOrHex), source: 'PuOr: Brewer (2003), ColorBrewer' };
    default: {
      const unreachable: never = name;
      throw new Error(`unknown colour map ${String(unreachable)}`);
    }
  }
}

/** A colour map by name; `reversed` swaps its ends (e.g. RdBu reversed: blue for negative, red for positive). */
export function getColormap(name: ColormapName, reversed = false): Colormap {
  const { kind, table, source } = publishedAnchors(name);
  const n = table.length / 3;
  const anchors = new Float64Array(table.length);
  for (let k = 0; k < n; k++) {
    const src = reversed ? n - 1 - k : k;
    for (let c = 0; c < 3; c++) anchors[3 * k + c] = table[3 * src + c] as number;
  }
  return { name, kind, reversed, anchors, source };
}

/** Colour at t in [0, 1] (clamped), as r, g, b in 0..1, interpolated between anchors. */
export function colormapUnitRgb(map: Colormap, t: number): [number, number, number] {
  const n = map.anchors.length / 3;
  const s = Math.min(Math.max(Number.isFinite(t) ? t : 0, 0), 1) * (n - 1);
  const k = Math.min(Math.floor(s), n - 2);
  const f = s - k;
  const a = map.anchors;
  return [
    (a[3 * k] as number) * (1 - f) + (a[3 * k + 3] as number) * f,
    (a[3 * k + 1] as number) * (1 - f) + (a[3 * k + 4] as number) * f,
    (a[3 * k + 2] as number) * (1 - f) + (a[3 * k + 5] as number) * f,
  ];
}

/** Colour at t as 8-bit r, g, b. */
export function colormapRgb(map: Colormap, t: number): [number, number, number] {
  const [r, g, b] = colormapUnitRgb(map, t);
  return [Math.round(r * 255), Math.round(g * 255), Math.round(b * 255)];
}

/** Colour at t as "#rrggbb". */
export function colormapHex(map: Colormap, t: number): string {
  return `#${colormapRgb(map, t)
    .map((c) => c.toString(16).padStart(2, '0'))
    .join('')}`;
}

/**
 * A lookup table of `size` 8-bit colours (r, g, b, r, g, b, ...) sampled evenly from t = 0 to 1,
 * for filling many pixels fast.
 */
export function colormapLut(map: Colormap, size = 1024): Uint8Array {
  const lut = new Uint8Array(3 * size);
  for (let k = 0; k < size; k++) lut.set(colormapRgb(map, k / (size - 1)), 3 * k);
  return lut;
}
