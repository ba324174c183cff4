/** Helpers for the map tests: case files in a temporary folder, the map run in-process, PNG pixels. */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PNG } from 'pngjs';
import { prepareMap, runMap, type MapRequest, type MapRun } from '../../src/map/run-map.js';

export const tmp = mkdtempSync(join(tmpdir(), 'fincheck-map-'));

export function caseFile(name: string, text: string): string {
  const path = join(tmp, name);
  writeFileSync(path, text);
  return path;
}

/** Runs a map in this thread (--jobs 1) through the library API. */
export async function mapInProcess(
  file: string,
  request: Omit<MapRequest, 'caseText' | 'fileName' | 'tolerance' | 'reference'> & Partial<MapRequest>,
): Promise<MapRun> {
  const prepared = await prepareMap({
    caseText: readFileSync(file, 'utf8'),
    fileName: file,
    tolerance: 0.02,
    reference: 'auto',
    ...request,
  });
  return runMap(prepared, { jobs: 1 });
}

export interface Image {
  width: number;
  height: number;
  data: Buffer;
}

export function decodePng(bytes: Uint8Array): Image {
  const png = PNG.sync.read(Buffer.from(bytes));
  return { width: png.width, height: png.height, data: png.data };
}

export function rgbAt(img: Image, x: number, y: number): [number, number, number] {
  const o = 4 * (Math.round(y) * img.width + Math.round(x));
  return [img.data[o] ?? 0, img.data[o + 1] ?? 0, img.data[o + 2] ?? 0];
}

/** Darkest channel-maximum in a (2r+1)^2 window: small when a black line passes through it. */
export function darkestNear(img: Image, x: number, y: number, r: number): number {
  let best = 255;
  for (let dy = -r; dy <= r; dy++) {
    for (let dx = -r; dx <= r; dx++) best = Math.min(best, Math.max(...rgbAt(img, x + dx, y + dy)));
  }
  return best;
}
