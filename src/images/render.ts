/**
 * SVG -> PNG with resvg (@resvg/resvg-js), text set in the DejaVu Sans files (regular and bold) that ship with the
 * `dejavu-fonts-ttf` package, or in their subsets (chart-font-subset.ts: the same glyphs, 63 kB instead of 757 kB,
 * which resvg reads again for every glyph) when every character of the SVG is in them. System fonts are never
 * loaded: the PNG bytes then depend only on the SVG and the options (resvg draws nothing for text when it has no
 * font, so the font file is required, and its absence is an error here).
 *
 * Size: the SVG is laid out in CSS px (96 per inch). `dpi` scales the raster by dpi / 96 and
 * records the resolution in the PNG (pHYs), so a 1200 px wide chart at 300 dpi is 3750 px wide
 * and still 12.5 in wide when placed in a document. `width` instead fixes the pixel width.
 * resvg is loaded on first use (dynamic import) so that commands that draw nothing start fast.
 */

import { createRequire } from 'node:module';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { inChartFontSubset } from './chart-font-subset.js';
import { fontFamily } from './text-metrics.js';
import { setPngDpi } from './png-dpi.js';

export interface RenderOptions {
  /** Output resolution in dots per inch; the raster is scaled by dpi / 96. Default 96. */
  dpi?: number;
  /** Output width in pixels (the height follows the aspect ratio); overrides the dpi scale, the dpi is still recorded. */
  width?: number;
}

let fontPaths: string[] | undefined;

/**
 * Absolute paths of DejaVuSans.ttf and DejaVuSans-Bold.ttf (titles are bold), resolved from this
 * module, so they are found from src/ and from the bundle in dist/ alike.
 */
export function fontFiles(): string[] {
  if (fontPaths !== undefined) return fontPaths;
  const require = createRequire(import.meta.url);
  const paths = ['DejaVuSans.ttf', 'DejaVuSans-Bold.ttf'].map((f) => require.resolve(`dejavu-fonts-ttf/ttf/${f}`));
  for (const path of paths) if (!existsSync(path)) throw new Error(`render: font file not found at ${path}`);
  fontPaths = paths;
  return paths;
}

let subsetPaths: string[] | null | undefined;

/**
 * Absolute paths of the subsets of DejaVuSans.ttf and DejaVuSans-Bold.ttf (chart-font-subset.ts), in fonts/ beside
 * this module (src/images/fonts, or dist/fonts where the build copies them); null when they are not there.
 */
export function subsetFontFiles(): string[] | null {
  if (subsetPaths !== undefined) return subsetPaths;
  const paths = ['DejaVuSans-subset.ttf', 'DejaVuSans-Bold-subset.ttf'].map((f) => fileURLToPath(new URL(`./fonts/${f}`, import.meta.url)));
  subsetPaths = paths.every((path) => existsSync(path)) ? paths : null;
  return subsetPaths;
}

/** The font files for `svg`: the subsets when they hold every character of it, else the full fonts. */
export function fontFilesFor(svg: string): string[] {
  const subsets = subsetFontFiles();
  return subsets !== null && inChartFontSubset(svg) ? subsets : fontFiles();
}

type ResvgModule = typeof import('@resvg/resvg-js');
let resvgModule: Promise<ResvgModule> | undefined;

function loadResvg(): Promise<ResvgModule> {
  resvgModule ??= import('@resvg/resvg-js');
  return resvgModule;
}

/** Rasterises an SVG to PNG bytes. Same SVG and options give the same bytes. */
export async function svgToPng(svg: string, options: RenderOptions = {}): Promise<Buffer> {
  const dpi = options.dpi ?? 96;
  if (!(dpi > 0) || !Number.isFinite(dpi)) throw new RangeError(`render: dpi must be a positive number, got ${dpi}`);
  if (options.width !== undefined && !(Number.isInteger(options.width) && options.width > 0)) {
    throw new RangeError(`render: width must be a positive integer, got ${options.width}`);
  }
  const { renderAsync } = await loadResvg();
  // renderAsync rasterises on libuv's thread pool: several charts render in parallel (map outputs).
  const rendered = await renderAsync(svg, {
    font: { loadSystemFonts: false, fontFiles: fontFilesFor(svg), defaultFontFamily: fontFamily },
    fitTo: options.width !== undefined ? { mode: 'width', value: options.width } : { mode: 'zoom', value: dpi / 96 },
    logLevel: 'off',
  });
  return setPngDpi(rendered.asPng(), dpi);
}

export type ChartFormat = 'png' | 'svg';

/** The bytes to write for a chart file (.png or .svg): the SVG text as UTF-8, or its PNG rendering. */
export async function chartBytes(svg: string, format: ChartFormat, options: RenderOptions = {}): Promise<Buffer> {
  switch (format) {
    case 'svg':
      return Buffer.from(svg, 'utf8');
    case 'png':
      return svgToPng(svg, options);
    default: {
      const unreachable: never = format;
      throw new Error(`unknown chart format ${String(unreachable)}`);
    }
  }
}
