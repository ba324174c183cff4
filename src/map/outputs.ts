/**
 * The files of a map, made in memory: map.csv, map.json, map-<model>.<format> per shortcut and
 * overview.<format>. PNGs are rendered by resvg with the bundled font (src/images render.ts), so the same map gives
 * the same bytes. `shouldStop` is asked between files, so Ctrl-C during rendering is not delayed by the rest.
 */
import { chartBytes, type ChartFormat } from '../images/index.js';
import { mapCsv } from './csv.js';
import { mapJsonText } from './json.js';
import { modelChart } from './model-chart.js';
import { overviewChart } from './overview-chart.js';
import type { MapRun } from './run-map.js';

export interface OutputFile {
  name: string;
  data: string | Uint8Array;
}

export class OutputsInterrupted extends Error {
  override name = 'OutputsInterrupted';
}

/** `shown`: the run as the charts show it (runInDisplayUnits); map.csv and map.json are always of `run`. */
export async function renderMapFiles(
  run: MapRun,
  format: ChartFormat,
  shouldStop: () => boolean = () => false,
  shown: MapRun = run,
): Promise<OutputFile[]> {
  const charts: { name: string; svg: () => string }[] = [
    ...run.job.check.models.map((model) => ({ name: `map-${model}.${format}`, svg: () => modelChart(shown, model).svg })),
    { name: `overview.${format}`, svg: () => overviewChart(shown).svg },
  ];
  // map.json lists every file of the set (itself included), so a later run into this folder knows what was ours.
  const names = ['map.csv', 'map.json', ...charts.map((c) => c.name)];
  const files: OutputFile[] = [
    { name: 'map.csv', data: mapCsv(run) },
    { name: 'map.json', data: mapJsonText(run, names) },
  ];
  // Build each SVG on this thread and hand it to resvg (which rasterises on the thread pool) before building the
  // next: the pause lets its render start, so the pool draws one chart while this thread builds the next one.
  const pending: Promise<OutputFile>[] = [];
  for (const chart of charts) {
    if (shouldStop()) throw new OutputsInterrupted('interrupted while drawing the charts');
    const svg = chart.svg();
    const file = chartBytes(svg, format).then((data) => ({ name: chart.name, data }));
    // Handled here too, so that a render failing during the pause is not an unhandled rejection; Promise.all below
    // still rejects with it.
    file.catch(() => undefined);
    pending.push(file);
    await new Promise((resolve) => setImmediate(resolve));
  }
  files.push(...(await Promise.all(pending)));
  if (shouldStop()) throw new OutputsInterrupted('interrupted while drawing the charts');
  return files;
}
