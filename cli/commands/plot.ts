/**
 * `fincheck plot CASE --out FILE.png|FILE.svg [--kind profile|flux|heatmap]`: one chart of the check.
 * Every option is validated (and the 2-D model's coverage checked for a heat map) before anything is
 * computed; the file is written whole or not at all.
 */
import { existsSync, statSync } from 'node:fs';
import { dirname, extname, resolve } from 'node:path';
import type { Command } from 'commander';
import { z } from 'zod';
import { UsageError } from '../../src/errors.js';
import { chartBytes, type ChartFormat } from '../../src/images/index.js';
import {
  plotSvg,
  type PlotSources,
  checkPlotInput,
  fieldStudy,
  heatmapAvailability,
  PLOT_KINDS,
  type PlotKind,
  SINK_PLOT_KINDS,
  type SinkPlotKind,
  sinkPlotAvailability,
  sinkPlotInput,
  sinkPlotSvg,
} from '../../src/plots/index.js';
import type { HeatSinkCase } from '../../src/case/index.js';
import { writeFilesAtomically } from '../../src/report/index.js';
import { loadAnyCaseInput } from '../case-input.js';
import type { Io } from '../io.js';
import { requireReference } from '../model-coverage.js';
import { displayUnitsOf, parseOption, referenceOption, toleranceOption, unitsHelp, withDisplayUnits } from '../options.js';

/** Canvas width and height in px at 96 dpi (the chart's layout size). */
export const widthOption = z.coerce.number().int().min(400).max(8000);
export const heightOption = z.coerce.number().int().min(300).max(8000);
/** Raster resolution: the PNG has width x dpi/96 pixels and records the dpi. */
export const dpiOption = z.coerce.number().min(48).max(1200);
export const kindOption = z.enum(PLOT_KINDS);
export const sinkKindOption = z.enum(SINK_PLOT_KINDS);
/** Every kind of either family, checked before the case is read; the case's family is checked after. */
export const anyKindOption = z.enum([...new Set([...PLOT_KINDS, ...SINK_PLOT_KINDS])] as [string, ...string[]]);

/** Largest PNG accepted, pixels (a 300 dpi A3 page is about 17 Mpx; resvg needs 4 bytes a pixel). */
export const MAX_PIXELS = 60e6;

export interface ImageOptions {
  width: number;
  height: number;
  dpi: number;
}

/** --width, --height, --dpi: parsed, and the raster size checked. */
export function parseImageOptions(o: { width: string; height: string; dpi: string }): ImageOptions {
  const width = parseOption('--width', widthOption, o.width, 'a whole number of px from 400 to 8000');
  const height = parseOption('--height', heightOption, o.height, 'a whole number of px from 300 to 8000');
  const dpi = parseOption('--dpi', dpiOption, o.dpi, 'a resolution from 48 to 1200 dots per inch');
  const pixels = Math.round((width * dpi) / 96) * Math.round((height * dpi) / 96);
  if (pixels > MAX_PIXELS) {
    throw new UsageError(
      `--width ${width} --height ${height} --dpi ${dpi}: the PNG would have ${(pixels / 1e6).toFixed(0)} Mpx; at most ${MAX_PIXELS / 1e6} Mpx (lower --dpi or the size)`,
    );
  }
  return { width, height, dpi };
}

/** --out FILE: .png or .svg, in a folder that exists, not itself a folder. */
export function parseOutFile(value: string | undefined): { path: string; format: ChartFormat } {
  if (value === undefined || value.trim() === '') throw new UsageError('--out: a file name ending in .png or .svg is required');
  const ext = extname(value).toLowerCase();
  if (ext !== '.png' && ext !== '.svg') throw new UsageError(`--out: got ${JSON.stringify(value)}; expected a file name ending in .png or .svg`);
  const path = resolve(value);
  const folder = dirname(path);
  if (!existsSync(folder) || !statSync(folder).isDirectory()) throw new UsageError(`--out: the folder ${folder} does not exist`);
  if (existsSync(path) && statSync(path).isDirectory()) throw new UsageError(`--out: ${value} is a folder; give a file name`);
  return { path, format: ext === '.png' ? 'png' : 'svg' };
}

interface PlotCliOptions {
  out?: string;
  kind: string;
  width: string;
  height: string;
  dpi: string;
  tolerance: string;
  reference: string;
  json?: boolean;
  units?: string;
}

const DESCRIPTIONS: Record<PlotKind, string> = {
  profile: 'temperature along the fin, every model',
  flux: 'heat flow along the fin and heat lost per unit length, every model',
  heatmap: 'fd-2d temperature field on the fin section',
  sensitivity: 'tornado chart of d ln Q / d ln x of the reference for every input, with the uncertainty band',
};

const SINK_DESCRIPTIONS: Record<SinkPlotKind, string> = {
  profile: 'temperature up the hottest and the coolest fin against the uniform-base shortcut',
  plate: 'plate underside temperature seen from above, sources and fin footprints drawn',
  'fin-heat': 'heat per fin (bars)',
  sensitivity: "tornado chart of d ln rise / d ln x of the hottest source's mean rise (fd-3d) for every input, with the uncertainty band",
};

export function registerPlot(program: Command, io: Io): Command {
  return program
    .command('plot')
    .argument('<case>', 'case file (YAML or JSON); - reads it from standard input')
    .description('draw one chart of the check: temperature profiles, heat flow, or the 2-D temperature field')
    .option('--out <file>', 'output file: .png (rendered with the bundled font) or .svg')
    .option(
      '--kind <kind>',
      `a fin: profile (${DESCRIPTIONS.profile}), flux (${DESCRIPTIONS.flux}), heatmap (${DESCRIPTIONS.heatmap}) or sensitivity (${DESCRIPTIONS.sensitivity}); a heat sink: profile (${SINK_DESCRIPTIONS.profile}), plate (${SINK_DESCRIPTIONS.plate}), fin-heat (${SINK_DESCRIPTIONS['fin-heat']}) or sensitivity (${SINK_DESCRIPTIONS.sensitivity})`,
      'profile',
    )
    .option('--width <px>', 'chart width in px at 96 dpi', '1200')
    .option('--height <px>', 'chart height in px at 96 dpi', '750')
    .option('--dpi <dpi>', 'PNG resolution: the image has width x dpi/96 pixels (300 for print)', '96')
    .option('--tolerance <t>', 'drift accepted as ok, e.g. 2% or 0.02 (verdicts in the legend)', '2%')
    .option('--reference <model>', 'reference model: auto (2-D where the case allows), 1d or 2d', 'auto')
    .option('--json', 'print one JSON document describing the file written')
    .option('--units <system>', unitsHelp)
    .addHelpText(
      'after',
      `
Examples:
  fincheck plot demo/inverter-plate-fin.yaml --out profile.png
  fincheck plot demo/motor-housing-tapered-fin.yaml --kind heatmap --out field.svg
  fincheck plot demo/led-pin-fin.yaml --kind flux --out flux.png --dpi 300   # 3750 x 2344 px for print
  fincheck plot demo/motor-drive-sink.yaml --kind plate --out plate.png      # a heat sink`,
    )
    .action(async (file: string, o: PlotCliOptions) => {
      const anyKind = parseOption('--kind', anyKindOption, o.kind, `${PLOT_KINDS.join(', ')} (a fin) or ${SINK_PLOT_KINDS.join(', ')} (a heat sink)`);
      const out = parseOutFile(o.out);
      const image = parseImageOptions(o);
      if (out.format === 'svg' && image.dpi !== 96) throw new UsageError('--dpi: applies to PNG output only (an SVG scales without loss)');
      const tolerance = parseOption('--tolerance', toleranceOption, o.tolerance);
      const reference = parseOption('--reference', referenceOption, o.reference, 'auto, 1d or 2d');
      displayUnitsOf(o.units, undefined);
      const any = await loadAnyCaseInput(file, io);
      if (any.kind === 'heat-sink') {
        if (reference !== 'auto') throw new UsageError(`--reference ${reference}: a heat sink's reference is fd-3d; leave --reference at auto`);
        await plotSink(
          withDisplayUnits(any.case, o.units),
          parseOption('--kind', sinkKindOption, anyKind, `${SINK_PLOT_KINDS.join(', ')} for a heat sink`),
          out,
          image,
          tolerance,
          o.json === true,
          io,
        );
        return;
      }
      const c = withDisplayUnits(any.case, o.units);
      const kind = parseOption('--kind', kindOption, anyKind, `${PLOT_KINDS.join(', ')} for a single fin (plate and fin-heat are heat-sink charts)`);
      if (kind === 'heatmap') {
        const available = heatmapAvailability(c);
        if (!available.ok) throw new UsageError(`--kind heatmap: ${available.reason}`);
      } else requireReference(c, reference);

      const sources: PlotSources =
        kind === 'heatmap'
          ? { case: c, check: null, field: await fieldStudy(c) }
          : { case: c, check: await checkPlotInput(c, { tolerance, reference, ledger: false, sensitivities: kind === 'sensitivity' }), field: null };
      const svg = plotSvg(kind, sources, image, image.dpi / 96);
      const bytes = await chartBytes(svg, out.format, { dpi: image.dpi });
      writeFilesAtomically([{ path: out.path, bytes }]);

      const pixels =
        out.format === 'png'
          ? { width_px: Math.round((image.width * image.dpi) / 96), height_px: Math.round((image.height * image.dpi) / 96) }
          : { width_px: image.width, height_px: image.height };
      const models = sources.check ? sources.check.profiles.profiles.map((p) => p.model) : ['fd-2d'];
      const omitted = sources.check ? sources.check.profiles.omitted : [];
      if (o.json) {
        const summary = {
          case: c.name,
          kind,
          file: out.path,
          format: out.format,
          ...pixels,
          dpi: out.format === 'png' ? image.dpi : null,
          bytes: bytes.length,
          reference: sources.check ? sources.check.report.reference.model : 'fd-2d',
          models,
          omitted,
        };
        io.out(`${JSON.stringify(summary, null, 2)}\n`);
        return;
      }
      const size = out.format === 'png' ? `PNG ${pixels.width_px} x ${pixels.height_px} px, ${image.dpi} dpi` : `SVG ${image.width} x ${image.height}`;
      io.out(`wrote ${out.path} (${size}): ${DESCRIPTIONS[kind]} for ${c.name}\n`);
      io.out(`  models: ${models.join(', ')}${omitted.length > 0 ? `; not drawn: ${omitted.map((m) => `${m.model} (${m.reason})`).join('; ')}` : ''}\n`);
    });
}

/** `plot` on a heat sink: the check's fd-3d reference and shortcuts, one of the sink charts. */
async function plotSink(
  c: HeatSinkCase,
  kind: SinkPlotKind,
  out: { path: string; format: ChartFormat },
  image: ImageOptions,
  tolerance: number,
  json: boolean,
  io: Io,
) {
  const available = sinkPlotAvailability({ case: c }, kind);
  if (!available.ok) throw new UsageError(`--kind ${kind}: ${available.reason}; --kind plate draws it`);
  const input = await sinkPlotInput(c, tolerance, kind === 'sensitivity');
  const svg = sinkPlotSvg(kind, input, image, image.dpi / 96);
  const bytes = await chartBytes(svg, out.format, { dpi: image.dpi });
  writeFilesAtomically([{ path: out.path, bytes }]);
  const pixels =
    out.format === 'png'
      ? { width_px: Math.round((image.width * image.dpi) / 96), height_px: Math.round((image.height * image.dpi) / 96) }
      : { width_px: image.width, height_px: image.height };
  if (json) {
    const summary = {
      case: c.name,
      kind,
      file: out.path,
      format: out.format,
      ...pixels,
      dpi: out.format === 'png' ? image.dpi : null,
      bytes: bytes.length,
      reference: 'fd-3d',
    };
    io.out(`${JSON.stringify(summary, null, 2)}\n`);
    return;
  }
  const size = out.format === 'png' ? `PNG ${pixels.width_px} x ${pixels.height_px} px, ${image.dpi} dpi` : `SVG ${image.width} x ${image.height}`;
  io.out(`wrote ${out.path} (${size}): ${SINK_DESCRIPTIONS[kind]} for ${c.name}\n`);
}
