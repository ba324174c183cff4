/**
 * Several SVG charts rasterised with at most `concurrency` at a time. resvg renders on libuv's thread pool, so two
 * renders use both cores of a 2-core machine while the main thread waits; more would only add memory (a chart at
 * 400 dpi holds about 62 MB of pixels while it renders). `checkpoint` runs before each render starts and may throw
 * (an interrupt): no new render starts after that, the ones under way finish, then the promise rejects with its error.
 * The PNGs come back in the order of the SVGs, byte for byte what svgToPng gives one by one.
 */
import { svgToPng } from './render.js';

export interface RenderSeveralOptions {
  dpi: number;
  /** Renders at once (default 2). */
  concurrency?: number;
  /** Called before each render starts; may throw to stop. */
  checkpoint?: () => void;
}

export async function svgsToPngs(svgs: readonly string[], opts: RenderSeveralOptions): Promise<Buffer[]> {
  const concurrency = opts.concurrency ?? 2;
  if (!(Number.isInteger(concurrency) && concurrency >= 1)) throw new RangeError(`render: concurrency must be a positive integer, got ${concurrency}`);
  const pngs: Buffer[] = new Array<Buffer>(svgs.length);
  let next = 0;
  const lane = async (): Promise<void> => {
    while (next < svgs.length) {
      const k = next++;
      opts.checkpoint?.();
      pngs[k] = await svgToPng(svgs[k] as string, { dpi: opts.dpi });
    }
  };
  // Settled, not all: a lane that stops leaves the other's render to finish (it stops at its next checkpoint), so
  // nothing is still rendering when the promise rejects.
  const lanes = await Promise.allSettled(Array.from({ length: Math.min(concurrency, svgs.length) }, lane));
  const failed = lanes.find((l) => l.status === 'rejected');
  if (failed !== undefined) throw failed.reason;
  return pngs;
}
